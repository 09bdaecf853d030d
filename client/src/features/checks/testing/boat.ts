import { DEFAULT_LAUNCH_TEMPLATE, DEFAULT_STOW_TEMPLATE } from '@breakline/sync-protocol';
import { createRecord, type WriteContext } from '@/db/write';

// Invented test boat; the ranges are not any maker's figures.
export async function seedBoatAndTemplates(seed: WriteContext, templates = true) {
  const range = { minKpa: 17, maxKpa: 24 };
  const boatId = await createRecord(seed, 'boat', {
    fleetNumber: 'IRB 2', name: 'Gannet', hullSerial: null, notes: '', inService: true, requiredGear: [],
    airChambers: [
      { id: 'port', name: 'Port side pontoon', valve: 'Port valve', ...range },
      { id: 'starboard', name: 'Starboard side pontoon', valve: 'Starboard valve', ...range },
      { id: 'bow', name: 'Bow chamber', valve: 'Bow valve', ...range },
    ],
  });
  if (templates) {
    await createRecord(seed, 'checkTemplate', DEFAULT_LAUNCH_TEMPLATE);
    await createRecord(seed, 'checkTemplate', DEFAULT_STOW_TEMPLATE);
  }
  return boatId;
}
