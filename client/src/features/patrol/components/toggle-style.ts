/** A chosen toggle shown filled, so the choice reads at a glance in bright sun and not by a faint tint. */
export const chosenToggle = {
  '& .MuiToggleButton-root.Mui-selected, & .MuiToggleButton-root.Mui-selected:hover': { bgcolor: 'primary.main', color: 'primary.contrastText' },
  '& .MuiToggleButton-root': { fontWeight: 700 },
} as const;
