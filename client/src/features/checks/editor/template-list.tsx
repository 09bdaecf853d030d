import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import CircularProgress from '@mui/material/CircularProgress';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemText from '@mui/material/ListItemText';
import Paper from '@mui/material/Paper';
import Typography from '@mui/material/Typography';
import { kindSpec, roleAtLeast } from '@breakline/sync-protocol';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/app/paths';
import { PageHeader } from '@/components/page-header';
import { useRecords, useReplica } from '@/db/hooks';
import type { LocalRecord } from '@/db/types';
import { CHECK_NAMES } from '../components/check-names';
import { currentTemplate } from '../model/current-template';
import { versionsOf } from './template-writes';

const size = (t: LocalRecord<'checkTemplate'>) => {
  const items = t.fields.sections.reduce((n, s) => n + s.items.length, 0);
  return `${t.fields.sections.length} sections, ${items} items`;
};

function TypeCard({ type, templates, checks }: { type: 'launch' | 'stow'; templates: LocalRecord<'checkTemplate'>[]; checks: LocalRecord<'check'>[] }) {
  const versions = versionsOf(templates, type);
  const current = currentTemplate(templates, type);
  const used = (id: string) => checks.filter((c) => c.fields.templateId === id).length;
  const editor = roleAtLeast(useReplica().role, kindSpec('checkTemplate').access.update);
  const verb = !editor ? 'Read' : current ? 'Edit' : 'Set up';
  const twins = current ? versions.filter((v) => v.fields.templateVersion === current.fields.templateVersion && !v.fields.retired) : [];
  return (
    <Paper component="section" aria-label={CHECK_NAMES[type]} variant="outlined" sx={{ p: 2, display: 'grid', gap: 1 }}>
      <Typography variant="h6" component="h2" sx={{ fontWeight: 700 }}>{CHECK_NAMES[type]}</Typography>
      <Typography>{current ? `Version ${current.fields.templateVersion} in use: ${size(current)}.` : 'Not set up yet: crews cannot start one.'}</Typography>
      {twins.length > 1 && (
        <Alert severity="warning">
          Two version {current!.fields.templateVersion}s were saved on different phones. New checks use one of them; open the template, check it, and
          save it again to settle which.
        </Alert>
      )}
      <Button component={RouterLink} to={paths.templateEdit.href(type)} variant="contained" size="large" sx={{ minHeight: 56 }}>
        {verb} the {CHECK_NAMES[type].toLowerCase()}
      </Button>
      {versions.length > 0 && (
        <List dense disablePadding aria-label={`${CHECK_NAMES[type]} versions`}>
          {versions.map((v) => (
            <ListItem key={v.id} disableGutters divider>
              <ListItemText
                primary={`Version ${v.fields.templateVersion}${v.id === current?.id ? ' (in use)' : v.fields.retired ? ' (retired)' : ''}`}
                secondary={`${size(v)} · run by ${used(v.id) === 1 ? '1 check' : `${used(v.id)} checks`}${v.waiting ? ' · not sent yet' : ''}`}
              />
            </ListItem>
          ))}
        </List>
      )}
    </Paper>
  );
}

/** The club's check templates and their versions; each check keeps the version it was run against. */
export function TemplateList() {
  const templates = useRecords('checkTemplate');
  const checks = useRecords('check');
  if (!templates || !checks) return <CircularProgress aria-label="Loading the templates" />;
  return (
    <Box sx={{ display: 'grid', gap: 2, maxWidth: 860 }}>
      <PageHeader title="Check templates" subtitle="What the launch and stow checks ask, screen by screen. Editing saves a new version; past checks keep theirs." />
      <TypeCard type="launch" templates={templates} checks={checks} />
      <TypeCard type="stow" templates={templates} checks={checks} />
    </Box>
  );
}
