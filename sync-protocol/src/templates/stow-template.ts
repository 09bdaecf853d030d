import type { CheckTemplateFields } from '../kinds/check-template.js';
import { CAUTIONS } from './cautions.js';

/** The stow check: the boat left fit for the next call-out. */
export const DEFAULT_STOW_TEMPLATE: CheckTemplateFields = {
  checkType: 'stow',
  name: 'Stow check',
  templateVersion: 1,
  retired: false,
  sections: [
    {
      id: 'wash', title: 'Wash down and drain', system: 'hull',
      items: [
        { id: 'wash-down', label: 'Hull, floor and gear washed down with fresh water', kind: 'pass-fail', critical: false },
        { id: 'drained', label: 'Boat drained and drain bungs refitted', kind: 'pass-fail', critical: false },
      ],
    },
    {
      id: 'flush', title: 'Motor flush', system: 'motor',
      items: [
        { id: 'flush-run', label: 'Motor flushed with fresh water in neutral for three to five minutes', kind: 'pass-fail', critical: false, caution: CAUTIONS.flush },
        { id: 'tell-tale', label: 'Tell-tale showed a steady stream during the flush', kind: 'pass-fail', critical: true },
        { id: 'dewater', label: 'Dewatering spray applied under the cowling', kind: 'pass-fail', critical: false },
      ],
    },
    {
      id: 'damage', title: 'Damage inspection', system: 'motor leg and propeller',
      items: [
        { id: 'leg', label: 'Motor leg, water intake and cavitation plate free of damage', kind: 'pass-fail', critical: true },
        { id: 'prop-stow', label: 'Propeller, lock nut and split pin undamaged', kind: 'pass-fail', critical: true },
        { id: 'hull-stow', label: 'Hull and air chambers undamaged', kind: 'pass-fail', critical: true },
        { id: 'damage-notes', label: 'Damage seen this session (write "none" if none)', kind: 'text', critical: false },
      ],
    },
    {
      id: 'fuel-safe', title: 'Fuel made safe', system: 'fuel',
      items: [
        { id: 'fuel-disconnected', label: 'Fuel line disconnected and bladder stored as the club requires', kind: 'pass-fail', critical: false, caution: CAUTIONS.fuel },
      ],
    },
  ],
};
