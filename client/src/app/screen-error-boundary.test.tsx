import { render, screen } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { ScreenErrorBoundary } from './screen-error-boundary';

function Broken(): never {
  throw new Error('Failed to fetch dynamically imported module: /assets/checks-page.js');
}

describe('a screen that cannot be shown', () => {
  it('says so with the reason instead of leaving an empty page, and clears when the address changes', () => {
    // React reports the caught error on the console as well; the test is about what the person sees.
    vi.spyOn(console, 'error').mockImplementation(() => {});
    const view = render(
      <ScreenErrorBoundary resetKey="/checks">
        <Broken />
      </ScreenErrorBoundary>,
    );
    expect(screen.getByRole('alert')).toHaveTextContent('This screen could not be shown');
    expect(screen.getByText(/Failed to fetch dynamically imported module/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Reload' })).toBeInTheDocument();

    view.rerender(
      <ScreenErrorBoundary resetKey="/">
        <p>Today</p>
      </ScreenErrorBoundary>,
    );
    expect(screen.queryByRole('alert')).toBeNull();
    expect(screen.getByText('Today')).toBeInTheDocument();
  });

  it('keeps showing the failure while the address stays the same', () => {
    vi.spyOn(console, 'error').mockImplementation(() => {});
    const view = render(
      <ScreenErrorBoundary resetKey="/checks">
        <Broken />
      </ScreenErrorBoundary>,
    );
    view.rerender(
      <ScreenErrorBoundary resetKey="/checks">
        <p>Checks</p>
      </ScreenErrorBoundary>,
    );
    expect(screen.getByRole('alert')).toHaveTextContent('This screen could not be shown');
    expect(screen.queryByText('Checks')).toBeNull();
  });
});
