import type { AirChamber, PressureUnit } from '@breakline/sync-protocol';
import type { CheckItemEntry, TemplateItem } from '../model/types';

export interface ItemProps {
  item: TemplateItem;
  entry: CheckItemEntry | undefined;
  unit: PressureUnit;
  /** The boat's air chamber a pressure item reads, when the boat file has it. */
  chamber: AirChamber | undefined;
  clubId: string;
  readOnly: boolean;
  save: (entry: CheckItemEntry) => Promise<void>;
}
