import { useState, type FormEvent } from 'react';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import MenuItem from '@mui/material/MenuItem';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import { useSession } from '@/features/auth/use-auth';
import { isApiError } from '@/lib/api-error';
import { useSaveClubSettings } from '../api/club-settings';

const PRESSURE_UNITS = ['kPa', 'psi', 'bar', 'mbar'];
const WIND_UNITS = [['kn', 'knots'], ['km/h', 'km/h'], ['m/s', 'm/s']] as const;

/** The club's time zone, beach location, units and what sign-on does without a current award. */
export function ClubSettingsForm() {
  const { activeClub } = useSession();
  const [values, setValues] = useState({
    timeZone: activeClub.timeZone,
    latitude: activeClub.latitude === undefined ? '' : String(activeClub.latitude),
    longitude: activeClub.longitude === undefined ? '' : String(activeClub.longitude),
    pressureUnit: activeClub.pressureUnit,
    windUnit: activeClub.windUnit ?? 'kn',
    awardCheck: activeClub.awardCheck === 'block' ? 'block' : 'warn',
  });
  const [problems, setProblems] = useState<Record<string, string | undefined>>({});
  const save = useSaveClubSettings();
  const set = (field: keyof typeof values) => (e: { target: { value: string } }) => {
    setValues((v) => ({ ...v, [field]: e.target.value }));
    setProblems((p) => ({ ...p, [field]: undefined }));
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const latitude = Number(values.latitude);
    const longitude = Number(values.longitude);
    const found: Record<string, string | undefined> = {};
    if (values.latitude.trim() === '' || !Number.isFinite(latitude)) found.latitude = 'Give the latitude in degrees, e.g. -33.89 (south is negative).';
    if (values.longitude.trim() === '' || !Number.isFinite(longitude)) found.longitude = 'Give the longitude in degrees, e.g. 151.27 (west is negative).';
    if (values.timeZone.trim() === '') found.timeZone = 'Give the time zone by its IANA name, such as Australia/Sydney.';
    setProblems(found);
    if (Object.values(found).some(Boolean)) return;
    save.mutate(
      { timeZone: values.timeZone.trim(), latitude, longitude, pressureUnit: values.pressureUnit, windUnit: values.windUnit, awardCheck: values.awardCheck },
      { onError: (e) => { if (isApiError(e)) setProblems(Object.fromEntries(['timeZone', 'latitude', 'longitude', 'pressureUnit', 'windUnit', 'awardCheck'].map((f) => [f, e.fieldMessage(f)]))); } },
    );
  };

  return (
    <Paper component="section" aria-labelledby="club-settings-title" sx={{ p: 3, mt: 3 }}>
      <Typography id="club-settings-title" variant="h6" component="h2">
        Club settings
      </Typography>
      <Typography variant="body2" color="text.secondary" sx={{ mb: 2 }}>
        The time zone and beach location set local times, sunrise and sunset; the units are how pressures and wind are typed
        and shown. Phones pick changes up the next time they are online.
      </Typography>
      <Stack component="form" noValidate onSubmit={submit} spacing={2} aria-label="Club settings" sx={{ maxWidth: 520 }}>
        {save.isError && !isApiError(save.error, 'validation_failed') && <Alert severity="error">{save.error.message}</Alert>}
        {save.isSuccess && <Alert severity="success">Saved. This device uses the new settings now.</Alert>}
        <TextField label="Time zone (IANA name)" value={values.timeZone} onChange={set('timeZone')} error={Boolean(problems.timeZone)} helperText={problems.timeZone ?? 'For example Australia/Sydney or Pacific/Auckland'} />
        <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
          <TextField label="Latitude (°)" value={values.latitude} onChange={set('latitude')} error={Boolean(problems.latitude)} helperText={problems.latitude ?? 'WGS 84; south is negative'} slotProps={{ htmlInput: { inputMode: 'decimal' } }} fullWidth />
          <TextField label="Longitude (°)" value={values.longitude} onChange={set('longitude')} error={Boolean(problems.longitude)} helperText={problems.longitude ?? 'WGS 84; west is negative'} slotProps={{ htmlInput: { inputMode: 'decimal' } }} fullWidth />
        </Stack>
        <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
          <TextField select label="Pressure unit" value={values.pressureUnit} onChange={set('pressureUnit')} error={Boolean(problems.pressureUnit)} helperText={problems.pressureUnit} fullWidth>
            {PRESSURE_UNITS.map((u) => <MenuItem key={u} value={u}>{u}</MenuItem>)}
          </TextField>
          <TextField select label="Wind speed unit" value={values.windUnit} onChange={set('windUnit')} error={Boolean(problems.windUnit)} helperText={problems.windUnit} fullWidth>
            {WIND_UNITS.map(([v, l]) => <MenuItem key={v} value={v}>{l}</MenuItem>)}
          </TextField>
        </Stack>
        <TextField select label="Signing on without a current award" value={values.awardCheck} onChange={set('awardCheck')} error={Boolean(problems.awardCheck)} helperText={problems.awardCheck ?? 'Your club procedures decide who may drive or crew; this only sets what the phone does.'}>
          <MenuItem value="warn">Warn, and let the member sign on</MenuItem>
          <MenuItem value="block">Refuse the sign-on</MenuItem>
        </TextField>
        <Button type="submit" variant="contained" size="large" disabled={save.isPending} sx={{ alignSelf: 'flex-start' }}>
          {save.isPending ? 'Saving…' : 'Save club settings'}
        </Button>
      </Stack>
    </Paper>
  );
}
