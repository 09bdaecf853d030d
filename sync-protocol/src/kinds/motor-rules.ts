import type { MotorFields } from './motor.js';
import type { KindRules } from './spec.js';

export const motorRules: KindRules<MotorFields> = {
  label: 'a motor',
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
};
