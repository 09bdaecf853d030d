// Apart from the Beaufort tables: a club's settings name their wind unit without loading them.
export type WindSpeedUnit = 'kn' | 'm/s' | 'km/h';
export const WIND_SPEED_UNITS: readonly WindSpeedUnit[] = ['kn', 'm/s', 'km/h'];
