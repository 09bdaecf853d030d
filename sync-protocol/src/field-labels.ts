/** Plain names for fields whose camelCase name reads badly in a sentence. */
const LABELS: Record<string, string> = {
  minKpa: 'minimum pressure (kPa)',
  maxKpa: 'maximum pressure (kPa)',
  powerHp: 'power (hp)',
  windSpeedKn: 'wind speed (knots)',
  windDirectionDeg: 'wind direction (degrees)',
  waveHeightM: 'wave height (m)',
  fuelAddedL: 'fuel added (litres)',
  lat: 'latitude',
  lon: 'longitude',
  crewIds: 'crew',
};

/** "windSpeedKn" → "wind speed (knots)", "boatId" → "boat", "airChambers.0.maxKpa" → "air chambers #1 maximum pressure (kPa)". */
export function fieldLabel(path: readonly PropertyKey[]): string {
  if (path.length === 0) return 'the record';
  return path
    .map((part) => {
      if (typeof part === 'number') return `#${part + 1}`;
      const name = String(part);
      if (LABELS[name]) return LABELS[name];
      return name
        .replace(/Ids?$/, (m) => (m === 'Ids' ? 's' : ''))
        .replace(/([a-z0-9])([A-Z])/g, '$1 $2')
        .toLowerCase();
    })
    .join(' ')
    .trim();
}

export function sentence(path: readonly PropertyKey[], predicate: string): string {
  const s = `${fieldLabel(path)} ${predicate}`;
  return s.charAt(0).toUpperCase() + s.slice(1) + (/[.!?]$/.test(s) ? '' : '.');
}
