import type { ServiceRecordFields } from './service-record.js';
import { defineRules } from './spec.js';

export const serviceRecordRules = defineRules<ServiceRecordFields>({
  label: 'a service record',
  immutable: ['motorId'],
  access: { create: 'supervisor', update: 'supervisor', delete: 'admin' },
});
