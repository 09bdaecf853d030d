/** Safety reminders shown beside the check items they apply to. */
export const CAUTIONS = {
  testRun:
    'Run the motor only with its leg in a tub of water, in neutral, everyone clear and hands away from the propeller. ' +
    "The manufacturer's manual and the club's procedures come first.",
  flush:
    'Flush in neutral with the propeller clear of people and gear; stop at once if no cooling water shows at the tell-tale. ' +
    "Follow the manufacturer's manual.",
  fuel: 'Handle fuel away from any source of ignition, with the motor stopped and cool. Wipe up spills; no smoking.',
  killCord: 'The kill cord is attached to the driver whenever the motor runs.',
} as const;
