import { z } from 'zod';
import { boatRules } from './boat-rules.js';
import { label, positive, text } from './common.js';
import { defineKind } from './spec.js';

const airChamber = z
  .strictObject({
    id: label(40),
    name: label(60),
    valve: text(60),
    minKpa: positive(),
    maxKpa: positive(),
  })
  .refine((c) => c.minKpa <= c.maxKpa, {
    error: 'must not be above the maximum pressure',
    path: ['minKpa'],
  });

const gear = z.strictObject({ item: label(80), count: z.number().int().min(1) });

const boatSchema = z.strictObject({
  fleetNumber: label(20),
  name: label(80),
  hullSerial: text(40).nullable(),
  airChambers: z.array(airChamber).max(20),
  requiredGear: z.array(gear).max(60),
  notes: text(4000),
  inService: z.boolean(),
});

/** A boat and its specification: chambers with the maker's pressure range, gear it carries. */
export const boatSpec = defineKind({ ...boatRules, schema: boatSchema });
export type BoatFields = z.infer<typeof boatSchema>;
export type AirChamber = BoatFields['airChambers'][number];
