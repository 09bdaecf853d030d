import { memo } from 'react';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Paper from '@mui/material/Paper';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { usualCautions } from '../model/cautions';
import { ItemEditor } from './item-editor';
import type { ChamberChoice } from './kind-fields';
import { MoveButtons } from './move-buttons';
import type { DraftAction, SectionDraft, TemplateErrors } from './template-draft';

interface Props {
  checkType: 'launch' | 'stow';
  section: SectionDraft;
  index: number;
  count: number;
  errors: TemplateErrors;
  chambers: readonly ChamberChoice[];
  /** Its items are shown for editing; a closed section shows only what it holds. */
  open: boolean;
  onToggle: (key: string) => void;
  dispatch: (action: DraftAction) => void;
}

const summary = (s: SectionDraft) => {
  const critical = s.items.filter((i) => i.critical).length;
  return `${s.items.length === 1 ? '1 item' : `${s.items.length} items`}, ${critical} critical`;
};

/** One screen of the check: a system of the boat and its items, opened one at a time on a phone. */
export const SectionEditor = memo(function SectionEditor({ checkType, section, index, count, errors, chambers, open, onToggle, dispatch }: Props) {
  const at = `sections.${index}`;
  const set = (change: Extract<DraftAction, { type: 'section' }>['change']) => dispatch({ type: 'section', si: index, change });
  const own = new Set(section.items.map((i) => i.caution.trim()).filter(Boolean));
  const always = usualCautions(checkType, section.system).filter((c) => !own.has(c));
  const title = section.title.trim() || 'untitled';
  const wrong = Object.keys(errors).some((k) => k === at || k.startsWith(`${at}.`));
  const toggle = (
    <Button variant={open ? 'outlined' : 'contained'} size="large" aria-expanded={open} onClick={() => onToggle(section.key)} sx={{ minHeight: 56 }}>
      {open ? `Close section ${index + 1}` : `Edit section ${index + 1}`}
    </Button>
  );
  return (
    <Paper
      id={section.key}
      component="section"
      aria-label={`Section ${index + 1}: ${title}`}
      variant="outlined"
      sx={{ p: { xs: 1.5, sm: 2 }, display: 'grid', gap: 1.5, bgcolor: 'background.default', scrollMarginTop: 80, borderColor: wrong ? 'error.main' : undefined, borderWidth: wrong ? 2 : 1 }}
    >
      <Box sx={{ display: 'flex', justifyContent: 'space-between', alignItems: 'center', gap: 1, flexWrap: 'wrap' }}>
        <Typography variant="h6" component="h2" sx={{ fontWeight: 700 }}>Section {index + 1}: {title}</Typography>
        <MoveButtons what={`section ${index + 1}`} index={index} count={count} onMove={(by) => dispatch({ type: 'move-section', si: index, by })} onRemove={() => dispatch({ type: 'remove-section', si: index })} />
      </Box>
      <Typography sx={{ color: wrong ? 'error.main' : 'text.secondary', fontWeight: wrong ? 700 : 400 }}>
        {summary(section)} · part of the boat: {section.system.trim() || 'not given'}{wrong ? ' · needs fixing' : ''}
      </Typography>
      {!open && (
        <Box component="ol" sx={{ m: 0, pl: 3, color: 'text.secondary' }}>
          {section.items.map((i) => <li key={i.key}>{i.label.trim() || '(not named yet)'}{i.critical ? ' · critical' : ''}</li>)}
        </Box>
      )}
      {!open && toggle}
      {open && (
        <>
          <TextField label="Section title (the screen's heading)" value={section.title} onChange={(e) => set({ title: e.target.value })} error={Boolean(errors[`${at}.title`])} helperText={errors[`${at}.title`]} />
          <TextField
            label="Part of the boat it covers"
            value={section.system}
            onChange={(e) => set({ system: e.target.value })}
            error={Boolean(errors[`${at}.system`])}
            helperText={errors[`${at}.system`] ?? 'e.g. hull, air chambers, fuel, motor, rescue gear. A "motor" or "fuel" section always shows its usual caution.'}
          />
          {always.length > 0 && (
            <Alert severity="warning" variant="outlined" role="note" aria-label={`Cautions always shown in section ${index + 1}`}>
              Always shown on this screen: {always.join(' ')}
            </Alert>
          )}
          {errors[at] && <Alert severity="error">{errors[at]}</Alert>}
          {section.items.map((item, i) => (
            <ItemEditor key={item.key} item={item} si={index} index={i} count={section.items.length} errors={errors} chambers={chambers} dispatch={dispatch} />
          ))}
          <Button variant="outlined" size="large" onClick={() => dispatch({ type: 'add-item', si: index })}>
            Add an item to section {index + 1}
          </Button>
          {toggle}
        </>
      )}
    </Paper>
  );
});
