import { z } from 'zod';
import { atLeastZero, label, positive, recordId, utcTime } from './common.js';
import { defineKind } from './spec.js';

/** An outboard motor; it moves between boats, so it is its own record. */
export const motorSpec = defineKind({
  label: 'a motor',
  schema: z.strictObject({
    serial: label(40),
    model: label(80),
    powerHp: positive().max(300),
    hourMeter: atLeastZero(),
    serviceIntervalHours: positive().nullable(),
    serviceIntervalMonths: z.number().int().min(1).max(120).nullable(),
    lastServiceAt: utcTime().nullable(),
    lastServiceHours: atLeastZero().nullable(),
    fuelMode: z.enum(['premix', 'oil-injection']),
    /** Petrol to oil, e.g. 50 for 50:1; from the motor's manual, never assumed. */
    premixRatio: z.number().min(10).max(200).nullable(),
    boatId: recordId().nullable(),
  }),
  // Drivers read the hour meter after a trip; everything else is the gear officer's.
  access: {
    create: 'supervisor',
    update: 'supervisor',
    delete: 'admin',
    fieldRoles: [{ field: 'hourMeter', minRole: 'driver' }],
  },
  recordChecks: (m) => {
    const errors = [];
    if (m.fuelMode === 'premix' && m.premixRatio === null) {
      errors.push({ field: 'premixRatio', message: 'Premix ratio is needed for a premix motor (see its manual).' });
    }
    if (m.serviceIntervalHours === null && m.serviceIntervalMonths === null) {
      errors.push({ field: 'serviceIntervalHours', message: 'Give a service interval in hours, in months, or both.' });
    }
    return errors;
  },
});
export type MotorFields = z.infer<typeof motorSpec.schema>;
