import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { listRecords } from '@/db/queries';
import { createRecord } from '@/db/write';
import { mockApi } from '@/test/api-mock';
import { renderApp } from '@/test/render-app';
import { PHONE_WIDTH, setViewportWidth } from '@/test/viewport';
import { testPerson } from '@/test/test-person';

describe('reporting a defect on its own', () => {
  it('saves boat, severity, description and a photo kept on the phone by its hash', async () => {
    setViewportWidth(PHONE_WIDTH);
    // Under jsdom, Node's WebCrypto refuses the DOM realm's ArrayBuffer; hand it a view of the same
    // bytes so the real SHA-256 runs. Browsers take the buffer as it is.
    const digest = crypto.subtle.digest.bind(crypto.subtle);
    vi.spyOn(crypto.subtle, 'digest').mockImplementation((alg, data) =>
      digest(alg, data instanceof Uint8Array ? data : new Uint8Array(data as ArrayBuffer)));
    const p = testPerson('crew');
    mockApi({ 'GET /api/auth/me': p.me });
    const boatId = await createRecord(p.seed, 'boat', {
      fleetNumber: 'IRB 1', name: 'Tern', hullSerial: null, airChambers: [], requiredGear: [], notes: '', inService: true,
    });
    const user = userEvent.setup();
    renderApp(`/defects/new?boat=${boatId}`, p.session);
    await user.click(await screen.findByRole('button', { name: 'Save defect' }));
    expect(screen.getByText('Choose how serious it is.')).toBeInTheDocument();
    expect(screen.getByText('Say what is wrong and where on the boat.')).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: /^Limit/ }));
    await user.type(screen.getByLabelText('What is wrong'), 'Tow rope frayed at the eye');
    await user.upload(screen.getByLabelText('Photo'), new File([new Uint8Array([137, 80, 78, 71, 1, 2, 3])], 'rope.png', { type: 'image/png' }));
    await waitFor(async () => expect(await p.ctx.db.photos.count()).toBe(1));
    await user.click(screen.getByRole('button', { name: 'Save defect' }));

    expect(await screen.findByRole('heading', { name: 'Tow rope frayed at the eye' })).toBeInTheDocument();
    const [defect] = await listRecords(p.ctx.db, p.ctx.clubId, 'defect');
    const [photo] = await p.ctx.db.photos.toArray();
    expect(defect!.fields).toMatchObject({ boatId, severity: 'limit', status: 'open', reportedBy: p.ctx.userId, photos: [photo!.sha256] });
    expect(photo).toMatchObject({ type: 'image/png', state: 'kept' });
  }, 30_000);
});
