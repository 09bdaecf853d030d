const deg = (n: number, pos: string, neg: string) => `${Math.abs(n).toFixed(5)}° ${n < 0 ? neg : pos}`;

/** "33.28712° S, 151.57235° E": WGS 84 degrees as a person reads them. */
export function latLonText(lat: number, lon: number): string {
  return `${deg(lat, 'N', 'S')}, ${deg(lon, 'E', 'W')}`;
}
