import type { ServiceRecordFields } from './service-record.js';
import type { KindRules } from './spec.js';

export const serviceRecordRules: KindRules<ServiceRecordFields> = {
  label: 'a service record',
  immutable: ['motorId'],
  access: { create: 'supervisor', update: 'supervisor', delete: 'admin' },
};
