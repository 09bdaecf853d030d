import { vi } from 'vitest';

/**
 * jsdom has no matchMedia; this answers the min-width/max-width queries MUI's breakpoints ask,
 * as a screen `width` px wide would.
 */
export function setViewportWidth(width: number): void {
  const matches = (query: string) =>
    [...query.matchAll(/\((min|max)-width:\s*([\d.]+)px\)/g)].every(([, kind, px]) =>
      kind === 'min' ? width >= Number(px) : width <= Number(px),
    );
  vi.stubGlobal('matchMedia', (query: string) => ({
    matches: matches(query),
    media: query,
    onchange: null,
    addListener: () => {},
    removeListener: () => {},
    addEventListener: () => {},
    removeEventListener: () => {},
    dispatchEvent: () => false,
  }));
}

export const PHONE_WIDTH = 390;
export const DESKTOP_WIDTH = 1280;
