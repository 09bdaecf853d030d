import { premix, PREMIX_CAUTION, type KindFields } from '@breakline/sync-protocol';

export interface FuelLines {
  /** One line a convention, each with the figure and the wording of the convention. */
  lines: { oil: string; wording: string }[];
  note: string;
}

const ml = (n: number) => `${n.toFixed(n < 100 ? 1 : 0)} mL`;

/**
 * The premix oil for fuel added, under both readings of the motor's ratio, since manuals and cans
 * differ on whether the volume is the petrol or the finished mix.
 */
export function premixFor(litres: number | null, motor: KindFields['motor'] | null): FuelLines | null {
  if (litres === null || litres === 0) return null;
  if (!motor) return { lines: [], note: 'No motor is linked to this trip, so no premix figure can be given.' };
  if (motor.fuelMode === 'oil-injection') return { lines: [], note: `${motor.model} injects its own oil: add petrol only, as its manual says.` };
  if (motor.premixRatio === null) return { lines: [], note: `${motor.model} has no premix ratio in its record: a supervisor enters it from the manual.` };
  const ratio = motor.premixRatio;
  return {
    lines: (['petrol-to-oil', 'total-mix'] as const).map((c) => {
      const p = premix(litres, ratio, c);
      const oil = c === 'petrol-to-oil'
        ? `Into ${litres} L of petrol: ${ml(p.oilMl)} of two-stroke oil`
        : `For ${litres} L of mix in all: ${ml(p.oilMl)} of two-stroke oil with ${Number(p.petrolLitres.toFixed(2))} L of petrol`;
      return { oil, wording: p.wording };
    }),
    note: PREMIX_CAUTION,
  };
}
