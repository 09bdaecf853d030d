import { useEffect, useState, type ReactNode } from 'react';
import Box from '@mui/material/Box';
import CircularProgress from '@mui/material/CircularProgress';
import Typography from '@mui/material/Typography';
import { useSearchParams } from 'react-router-dom';
import { EmptyState } from '@/components/empty-state';
import { useRecord, useReplica } from '@/db/hooks';
import { isLocalWriteError } from '@/db/write-error';
import { useSession } from '@/features/auth/use-auth';
import { clubPressureUnit } from '@/lib/pressure-entry';
import { resumeSection, unansweredItems } from '../model/progress';
import type { FailedItem } from '../model/types';
import { finishCheck } from '../model/writes';
import { CHECK_NAMES } from './check-names';
import { CheckReview } from './check-review';
import { RunnerNav } from './runner-nav';
import { RunnerProgress } from './runner-progress';
import { SectionScreen } from './section-screen';

/**
 * A check, one section a screen. The screen number lives in the address, so a reload or a
 * return from the camera opens the same screen; without one the runner opens where the check was left.
 */
export function CheckRunner({ checkId, reportDefect }: { checkId: string; reportDefect?: (failed: FailedItem) => ReactNode }) {
  const check = useRecord('check', checkId);
  const template = useRecord('checkTemplate', check?.fields.templateId);
  const boat = useRecord('boat', check?.fields.boatId);
  const ctx = useReplica();
  const { activeClub } = useSession();
  const [params, setParams] = useSearchParams();
  const [refusal, setRefusal] = useState<string | null>(null);
  const asked = Number(params.get('section'));
  const total = template?.fields.sections.length ?? 0;
  const valid = Number.isInteger(asked) && asked >= 1 && asked <= total + 1;
  useEffect(() => {
    if (check && template && !valid) setParams({ section: String(resumeSection(template.fields, check.fields.results) + 1) }, { replace: true });
  }, [check, template, valid, setParams]);
  if (check === undefined || (check && template === undefined)) return <CircularProgress aria-label="Loading the check" />;
  if (!check) return <EmptyState title="This check is not on this phone">Start a new one from Checks.</EmptyState>;
  if (!template) return <EmptyState title="The check's template is not on this phone">Connect to sync, then open the check again.</EmptyState>;
  if (!valid) return <CircularProgress aria-label="Opening the check" />;
  const index = asked - 1;
  const go = (i: number) => {
    setParams({ section: String(i + 1) });
    window.scrollTo?.({ top: 0 });
  };
  const items = template.fields.sections.reduce((n, s) => n + s.items.length, 0);
  const answered = items - unansweredItems(template.fields, check.fields.results).length;
  const readOnly = check.fields.status === 'complete';
  async function finish() {
    setRefusal(null);
    try {
      await finishCheck(ctx, checkId);
    } catch (e) {
      if (!isLocalWriteError(e)) throw e;
      setRefusal(e.message);
    }
  }
  return (
    <Box sx={{ display: 'grid', gap: 2 }}>
      <Typography variant="h6" component="h1" sx={{ fontWeight: 700 }}>
        {CHECK_NAMES[check.fields.checkType]} · {boat ? `${boat.fields.fleetNumber} ${boat.fields.name}` : 'a boat not on this phone'}
      </Typography>
      <RunnerProgress index={index} total={total} answered={answered} items={items} />
      {index < total ? (
        <SectionScreen check={check} section={template.fields.sections[index]!} chambers={boat?.fields.airChambers ?? []} unit={clubPressureUnit(activeClub.pressureUnit)} readOnly={readOnly} reportDefect={reportDefect} />
      ) : (
        <CheckReview check={check} template={template.fields} zone={activeClub.timeZone} refusal={refusal} onFinish={finish} goTo={go} />
      )}
      <RunnerNav index={index} total={total} go={go} />
    </Box>
  );
}
