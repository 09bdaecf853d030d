import type { ReactNode } from 'react';
import Box from '@mui/material/Box';
import CircularProgress from '@mui/material/CircularProgress';
import { kindSpec, roleAtLeast } from '@breakline/sync-protocol';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/app/paths';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';
import { useRecord, useRecords } from '@/db/hooks';
import { useSession } from '@/features/auth/use-auth';
import { motorDraftOf, newMotorDraft } from './motor-draft';
import { MotorForm } from './motor-form';
import { ReadOnlyNote } from './read-only-note';
import { loggedService } from './logged-service';
import { ServiceSection } from '../service/service-section';

/** A motor's page: its record (editable by supervisors and admins) and, below, `history`. */
export function MotorEditor({ motorId, history }: { motorId: string; history?: ReactNode }) {
  const isNew = motorId === 'new';
  const motor = useRecord('motor', isNew ? undefined : motorId);
  const serviceRecords = useRecords('serviceRecord');
  const trips = useRecords('trip');
  const { activeClub } = useSession();
  const navigate = useNavigate();
  const access = kindSpec('motor').access;
  const editable = roleAtLeast(activeClub.role, isNew ? access.create : access.update);
  if ((!isNew && motor === undefined) || !serviceRecords || !trips) return <CircularProgress aria-label="Loading the motor" />;
  if (!isNew && motor === null) return <EmptyState title="This motor is not on this phone">It may have been removed, or not synced here yet.</EmptyState>;
  if (isNew && !editable) return <ReadOnlyNote what="the fleet" />;
  const initial = motor ? motorDraftOf(motor.fields, activeClub.timeZone) : newMotorDraft();
  const sources = { serviceRecords, trips };
  const logged = motor ? loggedService(motor, sources, activeClub.timeZone) : undefined;
  return (
    <Box sx={{ display: 'grid', gap: 2 }}>
      <PageHeader title={motor ? `Motor ${motor.fields.serial}` : 'New motor'} subtitle="Motor specification and service" />
      {!editable && <ReadOnlyNote what="this motor's record" />}
      <MotorForm key={motor?.id ?? 'new'} motorId={motor?.id ?? null} fittedTo={motor?.fields.boatId ?? null} initial={initial} logged={logged} editable={editable} onSaved={() => navigate(paths.fleet.href())} />
      {motor && <ServiceSection motor={motor} sources={sources} />}
      {motor && history}
    </Box>
  );
}
