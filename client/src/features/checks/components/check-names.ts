export const CHECK_NAMES = { launch: 'Launch check', stow: 'Stow check' } as const;
