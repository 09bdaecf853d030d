import CircularProgress from '@mui/material/CircularProgress';
import Box from '@mui/material/Box';
import { kindSpec, roleAtLeast } from '@breakline/sync-protocol';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/app/paths';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';
import { useRecord } from '@/db/hooks';
import { useSession } from '@/features/auth/use-auth';
import { clubPressureUnit } from '@/lib/pressure-entry';
import { boatDraftOf, newBoatDraft } from './boat-draft';
import { BoatForm } from './boat-form';
import { ReadOnlyNote } from './read-only-note';

/** A boat's specification: a form for supervisors and admins, the same boxes read-only for others. */
export function BoatEditor({ boatId }: { boatId: string }) {
  const isNew = boatId === 'new';
  const boat = useRecord('boat', isNew ? undefined : boatId);
  const { activeClub } = useSession();
  const navigate = useNavigate();
  const unit = clubPressureUnit(activeClub.pressureUnit);
  const editable = roleAtLeast(activeClub.role, isNew ? kindSpec('boat').access.create : kindSpec('boat').access.update);
  if (!isNew && boat === undefined) return <CircularProgress aria-label="Loading the boat" />;
  if (!isNew && boat === null) return <EmptyState title="This boat is not on this phone">It may have been removed, or not synced here yet.</EmptyState>;
  if (isNew && !editable) return <ReadOnlyNote what="the fleet" />;
  const initial = boat ? boatDraftOf(boat.fields, unit) : newBoatDraft();
  return (
    <Box sx={{ display: 'grid', gap: 2 }}>
      <PageHeader title={boat ? `${boat.fields.fleetNumber} · ${boat.fields.name}` : 'New boat'} subtitle="Boat specification" />
      {!editable && <ReadOnlyNote what="this boat's specification" />}
      <BoatForm key={boat?.id ?? 'new'} boatId={boat?.id ?? null} initial={initial} unit={unit} editable={editable} onSaved={(id) => navigate(paths.boatFile.href(id))} />
    </Box>
  );
}
