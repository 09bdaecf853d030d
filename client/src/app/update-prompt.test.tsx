import { act, render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { pwaUpdates } from './pwa';
import { UpdatePrompt } from './update-prompt';

afterEach(() => pwaUpdates.announce(null));

describe('update prompt', () => {
  it('stays hidden until a new version waits, then reloads into it on request', async () => {
    render(<UpdatePrompt />);
    expect(screen.queryByText('A new version of Breakline is ready')).not.toBeInTheDocument();

    const apply = vi.fn();
    act(() => pwaUpdates.announce({ apply }));
    expect(await screen.findByText('A new version of Breakline is ready')).toBeInTheDocument();

    await userEvent.setup().click(screen.getByRole('button', { name: 'Reload' }));
    expect(apply).toHaveBeenCalledOnce();
  });
});
