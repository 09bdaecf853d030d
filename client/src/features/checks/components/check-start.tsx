import Box from '@mui/material/Box';
import CircularProgress from '@mui/material/CircularProgress';
import { useSearchParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { useRecords } from '@/db/hooks';
import { useSession } from '@/features/auth/use-auth';
import { currentTemplate } from '../model/current-template';
import { resumableCheck } from '../model/resume';
import { BoatPicker } from './boat-picker';
import { CheckTypePicker } from './check-type-picker';
import { StartPanel } from './start-panel';
import { TemplateMissing } from './template-missing';

/** Pick the check and the boat, then start or carry on. The choice is in the address for Back. */
export function CheckStart() {
  const [params, setParams] = useSearchParams();
  const type = params.get('type') === 'stow' ? 'stow' : 'launch';
  const boatId = params.get('boat');
  const boats = useRecords('boat');
  const templates = useRecords('checkTemplate');
  const checks = useRecords('check');
  const motors = useRecords('motor');
  const { activeClub } = useSession();
  if (!boats || !templates || !checks || !motors) return <CircularProgress aria-label="Loading" />;
  const choose = (change: { type?: string; boat?: string }) => {
    const next = { type, ...(boatId ? { boat: boatId } : {}), ...change };
    setParams(next, { replace: true });
  };
  const template = currentTemplate(templates, type);
  const missing = (['launch', 'stow'] as const).filter((t) => !currentTemplate(templates, t));
  const boat = boats.find((b) => b.id === boatId);
  const motorId = motors.find((m) => m.fields.boatId === boat?.id)?.id ?? null;
  return (
    <Box sx={{ display: 'grid', gap: 2 }}>
      <PageHeader title="Start a check" subtitle="One system a screen; every answer is saved on this phone as you go" />
      <CheckTypePicker value={type} onChange={(t) => choose({ type: t })} />
      {!template && <TemplateMissing missing={missing.length ? missing : [type]} />}
      <BoatPicker boats={boats} value={boat?.id ?? null} onChange={(id) => choose({ boat: id })} />
      {template && boat && (
        <StartPanel
          key={`${boat.id}:${type}`}
          boat={boat}
          motorId={motorId}
          template={template}
          resumable={resumableCheck(checks, boat.id, type, new Date().toISOString(), activeClub.timeZone)}
          zone={activeClub.timeZone}
        />
      )}
    </Box>
  );
}
