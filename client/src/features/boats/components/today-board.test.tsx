import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { DEFAULT_LAUNCH_TEMPLATE } from '@breakline/sync-protocol';
import { createRecord } from '@/db/write';
import { mockApi } from '@/test/api-mock';
import { renderApp } from '@/test/render-app';
import { PHONE_WIDTH, setViewportWidth } from '@/test/viewport';
import { boatFields, defectFields, passedResults } from '../testing/records';
import { testPerson } from '@/test/test-person';

async function seedBoat(seed: ReturnType<typeof testPerson>['seed'], fleetNumber: string, name: string) {
  return createRecord(seed, 'boat', boatFields({ fleetNumber, name }));
}

describe('Today', () => {
  it('shows each boat with its state as a word and a mark, the reasons and the next action', async () => {
    setViewportWidth(PHONE_WIDTH);
    const p = testPerson('crew');
    mockApi({ 'GET /api/auth/me': p.me });
    const fit = await seedBoat(p.seed, 'IRB 1', 'Gannet');
    const down = await seedBoat(p.seed, 'IRB 2', 'Petrel');
    await seedBoat(p.seed, 'IRB 3', 'Tern');
    const templateId = await createRecord(p.seed, 'checkTemplate', DEFAULT_LAUNCH_TEMPLATE);
    const now = new Date().toISOString();
    await createRecord(p.seed, 'check', {
      boatId: fit, motorId: null, checkType: 'launch', templateId, templateVersion: 1, startedAt: now, completedAt: now,
      status: 'complete', results: passedResults(DEFAULT_LAUNCH_TEMPLATE), performedBy: p.ctx.userId, signedOffBy: null, signedOffAt: null,
    });
    await createRecord(p.seed, 'defect', defectFields({ boatId: down, reportedAt: now, reportedBy: p.ctx.userId }));
    renderApp('/', p.session);

    const gannet = within(await screen.findByRole('article', { name: 'IRB 1 · Gannet' }));
    expect(await gannet.findByText('Fit')).toBeInTheDocument();
    expect(gannet.getByRole('link', { name: 'Run the stow check' })).toBeInTheDocument();

    const petrel = within(screen.getByRole('article', { name: 'IRB 2 · Petrel' }));
    expect(await petrel.findByText('Stood down')).toBeInTheDocument();
    expect(petrel.getByText('1 open defect')).toBeInTheDocument();
    expect(petrel.getByText(/^Stood down: defect "Port pontoon seam lifting near the transom"/)).toBeInTheDocument();
    expect(petrel.getByText(/Stood down: do not launch/)).toBeInTheDocument();
    expect(petrel.queryByRole('link', { name: /Run the/ })).toBeNull();

    const tern = within(screen.getByRole('article', { name: 'IRB 3 · Tern' }));
    expect(await tern.findByText('Unchecked')).toBeInTheDocument();
    expect(tern.getByRole('link', { name: 'Run the launch check' })).toHaveAttribute('href', expect.stringMatching(/^\/checks\/start\?type=launch&boat=/));
    // The mark is drawn beside the word, one a state.
    expect(document.querySelectorAll('[data-state-icon="unchecked"]')).toHaveLength(1);
  });
});
