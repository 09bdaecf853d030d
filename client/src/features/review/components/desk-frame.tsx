import type { ReactNode } from 'react';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import InsightsOutlined from '@mui/icons-material/InsightsOutlined';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/app/paths';
import { PageHeader } from '@/components/page-header';
import { DeskNav, type DeskScreen } from './desk-nav';

const SUBTITLE: Record<DeskScreen, string> = {
  checks: 'Every check from the club\'s devices, merged on the server. Open a row to see its versions; sign off completed checks.',
  trips: 'Every launch to retrieval. Open a row to see who changed what, and when.',
  defects: 'Every defect and where it is on its path to repair.',
  incidentNotes: 'Notes about rescues, assists, first aid and near misses. They can hold health information: open only what you need.',
  day: 'One day at the club: sign off its checks and close its log.',
  conflicts: 'Two devices changed the same field while offline: choose what the record keeps.',
};

/** The desk's heading and tabs around one of its screens. */
export function DeskFrame({ screen, children }: { screen: DeskScreen; children: ReactNode }) {
  return (
    <>
      <Stack direction="row" spacing={2} sx={{ alignItems: 'flex-start' }}>
        <div style={{ flexGrow: 1 }}>
          <PageHeader title="Review desk" subtitle={SUBTITLE[screen]} />
        </div>
        <Button variant="outlined" startIcon={<InsightsOutlined />} component={RouterLink} to={paths.seasonReport.href()}>
          Season report
        </Button>
      </Stack>
      <DeskNav current={screen} />
      {children}
    </>
  );
}
