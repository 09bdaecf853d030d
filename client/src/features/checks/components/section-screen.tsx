import type { ReactNode } from 'react';
import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';
import type { AirChamber, PressureUnit } from '@breakline/sync-protocol';
import type { LocalRecord } from '@/db/types';
import { sectionCautions } from '../model/cautions';
import type { FailedItem, TemplateSection } from '../model/types';
import { CautionList } from './caution-list';
import { ItemCard } from './item-card';

interface Props {
  check: LocalRecord<'check'>;
  section: TemplateSection;
  chambers: readonly AirChamber[];
  unit: PressureUnit;
  readOnly: boolean;
  reportDefect?: (failed: FailedItem) => ReactNode;
}

/** One system of the boat on one screen. */
export function SectionScreen({ check, section, chambers, unit, readOnly, reportDefect }: Props) {
  const c = check.fields;
  return (
    <Box sx={{ display: 'grid', gap: 2 }}>
      <Typography variant="h5" component="h2" sx={{ fontWeight: 700 }}>{section.title}</Typography>
      <CautionList cautions={sectionCautions(c.checkType, section)} />
      {section.items.map((item) => {
        const entry = c.results[item.id];
        const failed: FailedItem = { checkId: check.id, boatId: c.boatId, motorId: c.motorId, itemId: item.id, itemLabel: item.label, critical: item.critical, note: entry?.note };
        return (
          <ItemCard
            // Remount when another phone's answer arrives, so the boxes show it rather than stale text.
            key={`${item.id}:${JSON.stringify(entry?.value ?? null)}`}
            checkId={check.id}
            item={item}
            entry={entry}
            unit={unit}
            chamber={chambers.find((ch) => ch.id === item.chamberId)}
            clubId={check.clubId}
            readOnly={readOnly}
            onFailed={reportDefect?.(failed)}
          />
        );
      })}
    </Box>
  );
}
