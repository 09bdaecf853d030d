import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import CircularProgress from '@mui/material/CircularProgress';
import Paper from '@mui/material/Paper';
import Snackbar from '@mui/material/Snackbar';
import TextField from '@mui/material/TextField';
import { DEFAULT_LAUNCH_TEMPLATE, DEFAULT_STOW_TEMPLATE, kindSpec, roleAtLeast } from '@breakline/sync-protocol';
import { PageHeader } from '@/components/page-header';
import { BOTTOM_NAV_HEIGHT } from '@/app/shell/bottom-nav';
import { useRecords, useReplica } from '@/db/hooks';
import type { LocalRecord } from '@/db/types';
import { isLocalWriteError } from '@/db/write-error';
import { CHECK_NAMES } from '../components/check-names';
import { currentTemplate } from '../model/current-template';
import { ErrorSummary } from './error-summary';
import { SectionEditor } from './section-editor';
import { applyAction, buildTemplate, draftOf, keyAt, newSection, sameContent, type DraftAction, type TemplateDraft, type TemplateErrors } from './template-draft';
import { nextVersion, saveTemplateVersion } from './template-writes';
import { useStoredDraft } from './use-stored-draft';
import { chamberChoices } from './chamber-choices';

type CheckType = 'launch' | 'stow';
const DEFAULTS = { launch: DEFAULT_LAUNCH_TEMPLATE, stow: DEFAULT_STOW_TEMPLATE } as const;
const same = (a: TemplateDraft, b: TemplateDraft) => JSON.stringify(a) === JSON.stringify(b);

/** An admin's editor for the club's launch or stow check; saving makes the next version. */
export function TemplateEditor({ checkType }: { checkType: CheckType }) {
  const templates = useRecords('checkTemplate');
  const boats = useRecords('boat');
  if (!templates || !boats) return <CircularProgress aria-label="Loading the template" />;
  return <EditorBody checkType={checkType} templates={templates} boats={boats} />;
}

function EditorBody({ checkType, templates, boats }: { checkType: CheckType; templates: LocalRecord<'checkTemplate'>[]; boats: LocalRecord<'boat'>[] }) {
  const ctx = useReplica();
  const current = currentTemplate(templates, checkType);
  const clean = useMemo(() => draftOf(current?.fields ?? DEFAULTS[checkType]), [current, checkType]);
  const store = useStoredDraft(`breakline:template-draft:${ctx.clubId}:${checkType}`, current?.id ?? null, clean);
  const { setDraft, reset } = store;
  const [attempted, setAttempted] = useState(false);
  const [refusal, setRefusal] = useState<{ message: string; errors: TemplateErrors } | null>(null);
  const [saved, setSaved] = useState<number | null>(null);
  const [undo, setUndo] = useState<{ draft: TemplateDraft; what: string } | null>(null);
  const [saving, setSaving] = useState(false);
  const [openKeys, setOpenKeys] = useState<ReadonlySet<string>>(new Set());
  const [scrollTo, setScrollTo] = useState<string | null>(null);
  const editable = roleAtLeast(ctx.role, kindSpec('checkTemplate').access.create);
  const next = nextVersion(templates, checkType);
  const built = buildTemplate(store.draft, next);
  const shown: TemplateErrors = attempted && !built.ok ? built.errors : (refusal?.errors ?? {});
  // The same object while the messages are the same, so unchanged sections are not drawn again.
  const shownKey = JSON.stringify(shown);
  const errors = useMemo(() => JSON.parse(shownKey) as TemplateErrors, [shownKey]);
  const chambers = useMemo(() => chamberChoices(boats), [boats]);
  // Just saved, until the list of versions holds the new one: what is shown is what was saved.
  const settling = saved !== null && (current?.fields.templateVersion ?? 0) < saved;
  const unchanged = settling || (current !== undefined && built.ok && sameContent(built.fields, current.fields));

  // A version saved elsewhere replaces an untouched draft; edits are kept, with a warning.
  const baseFields = store.baseId === null ? DEFAULTS[checkType] : templates.find((t) => t.id === store.baseId)?.fields;
  const movedOn = current !== undefined && store.baseId !== current.id && baseFields !== undefined;
  const untouched = movedOn && same(store.draft, draftOf(baseFields!));
  useEffect(() => {
    if (untouched && current) reset(current.id, clean);
  }, [untouched, current, clean, reset]);

  const latest = useRef(store.draft);
  latest.current = store.draft;
  const dispatch = useCallback((action: DraftAction) => {
    setSaved(null);
    setRefusal(null);
    if (action.type === 'remove-section') setUndo({ draft: latest.current, what: `Section ${action.si + 1} removed.` });
    if (action.type === 'remove-item') setUndo({ draft: latest.current, what: `Item ${action.ii + 1} of section ${action.si + 1} removed.` });
    setDraft((d) => applyAction(d, action));
  }, [setDraft]);

  const onToggle = useCallback((key: string) => setOpenKeys((keys) => {
    const next = new Set(keys);
    if (!next.delete(key)) next.add(key);
    return next;
  }), []);
  const openAt = (paths: readonly string[]) => {
    const keys = paths.flatMap((p) => {
      const m = /^sections\.\d+/.exec(p);
      const key = m ? keyAt(store.draft, m[0]) : undefined;
      return key ? [key] : [];
    });
    setOpenKeys((old) => new Set([...old, ...keys]));
  };
  // An error's place is drawn only once its section is open: scroll there after that render.
  useEffect(() => {
    if (!scrollTo) return;
    const el = document.getElementById(scrollTo);
    el?.scrollIntoView?.({ behavior: 'smooth', block: 'start' });
    el?.querySelector<HTMLElement>('[aria-invalid="true"]')?.focus();
    setScrollTo(null);
  }, [scrollTo]);
  const goTo = (path: string) => {
    openAt([path]);
    setScrollTo(keyAt(store.draft, path) ?? null);
  };
  const addSection = () => {
    const section = newSection();
    setOpenKeys((old) => new Set([...old, section.key]));
    dispatch({ type: 'add-section', section });
  };

  async function save() {
    setAttempted(true);
    setRefusal(null);
    setSaved(null);
    if (!built.ok) {
      openAt(Object.keys(built.errors));
      // To the first box to fix; the list of all of them is by the Save button.
      setScrollTo(keyAt(store.draft, Object.keys(built.errors)[0]!) ?? null);
      return;
    }
    setSaving(true);
    try {
      const result = await saveTemplateVersion(ctx, store.draft);
      if (!result.ok) return;
      const fields = buildTemplate(store.draft, result.version);
      if (fields.ok) reset(result.id, draftOf(fields.fields));
      setAttempted(false);
      setSaved(result.version);
    } catch (e) {
      if (!isLocalWriteError(e)) throw e;
      setRefusal({ message: e.message, errors: Object.fromEntries(e.fields.map((f) => [f.field, f.message])) });
      openAt(e.fields.map((f) => f.field));
    } finally {
      setSaving(false);
    }
  }

  const name = CHECK_NAMES[checkType];
  const d = store.draft;
  return (
    <Box sx={{ display: 'grid', gap: 2, maxWidth: 860 }}>
      <PageHeader
        title={`${name} template`}
        subtitle={current ? `Version ${current.fields.templateVersion} is in use. Checks already run keep the version they were run against.` : 'Not set up yet'}
      />
      {!editable && <Alert severity="info">You can read this template. Only an admin may change it; ask one if something is wrong.</Alert>}
      {!current && (
        <Alert severity="info">
          The club has no {name.toLowerCase()} template yet. This is Breakline's default: edit it to the club's boats and procedures, then save it as version 1.
        </Alert>
      )}
      {movedOn && !untouched && (
        <Alert severity="warning">
          Version {current!.fields.templateVersion} was saved, on another phone or computer, after you began these changes. Your changes are kept here;
          saving them makes version {next} from what you see, and version {current!.fields.templateVersion}'s own changes are not in it. Discard your
          changes to start again from version {current!.fields.templateVersion}.
        </Alert>
      )}
      <Box component="fieldset" disabled={!editable} sx={{ border: 0, p: 0, m: 0, minWidth: 0, display: 'grid', gap: 2 }}>
        <TextField label="Name of the check" value={d.name} onChange={(e) => dispatch({ type: 'name', name: e.target.value })} error={Boolean(errors.name)} helperText={errors.name} />
        {errors.sections && <Alert severity="error">{errors.sections}</Alert>}
        {d.sections.map((s, i) => (
          <SectionEditor key={s.key} checkType={checkType} section={s} index={i} count={d.sections.length} errors={errors} chambers={chambers} open={openKeys.has(s.key)} onToggle={onToggle} dispatch={dispatch} />
        ))}
        {editable && (
          <Button variant="outlined" size="large" onClick={addSection}>
            Add a section
          </Button>
        )}
        <ErrorSummary draft={d} errors={errors} onGo={goTo} />
        {refusal && (
          <Alert severity="error">
            <AlertTitle>Not saved</AlertTitle>
            {refusal.message} Your changes are still here.
          </Alert>
        )}
        {editable && (
          <Paper
            elevation={6}
            sx={{
              position: 'sticky', bottom: { xs: `calc(${BOTTOM_NAV_HEIGHT + 8}px + env(safe-area-inset-bottom))`, md: 16 }, zIndex: 2,
              p: 1.5, display: 'grid', gridTemplateColumns: '1fr 1.4fr', gap: 1, alignItems: 'center',
            }}
          >
            {saved !== null && (
              // Beside the button pressed, so it is seen wherever the page was scrolled to.
              <Alert severity="success" role="status" sx={{ gridColumn: '1 / -1' }}>
                Saved as version {saved}. Checks started from now on use it; checks already run, or in progress, keep the version they began with.
              </Alert>
            )}
            <Button variant="outlined" size="large" disabled={!store.dirty || saving} onClick={() => { reset(current?.id ?? null, clean); setAttempted(false); setRefusal(null); }} sx={{ minHeight: 56 }}>
              Discard changes
            </Button>
            <Button variant="contained" size="large" disabled={saving || unchanged} onClick={() => void save()} sx={{ minHeight: 56 }}>
              {unchanged ? 'No changes to save' : `Save as version ${next}`}
            </Button>
          </Paper>
        )}
      </Box>
      <Snackbar
        open={undo !== null}
        autoHideDuration={10_000}
        onClose={() => setUndo(null)}
        message={undo?.what}
        action={
          <Button color="inherit" size="large" onClick={() => { if (undo) reset(store.baseId, undo.draft); setUndo(null); }}>
            Undo
          </Button>
        }
      />
    </Box>
  );
}
