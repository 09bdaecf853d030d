import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/app/paths';
import type { LocalRecord } from '@/db/types';
import { motorService, motorUsage } from '../readiness/motor-input';
import type { ReadinessContext } from '../readiness/adapt';

const fuelWords = (m: LocalRecord<'motor'>['fields']) =>
  m.fuelMode === 'oil-injection' ? 'oil injection' : `premix ${m.premixRatio ?? '?'}:1 (petrol to oil, from the motor's manual)`;

const SERVICE_WORDS = { ok: 'Service not yet due', 'due-soon': 'Service due soon', overdue: 'Service overdue' } as const;

/** The motor fitted now and where it stands for service. */
export function MotorSummary(props: { motor: LocalRecord<'motor'>; trips: readonly LocalRecord<'trip'>[]; ctx: ReadinessContext }) {
  const { motor, trips, ctx } = props;
  const m = motor.fields;
  const service = motorService(m, motorUsage(motor.id, trips, ctx.zone), ctx.now, ctx.zone);
  return (
    <Box>
      <Typography sx={{ fontWeight: 700 }}>
        {m.model}, {m.powerHp} hp
      </Typography>
      <Typography variant="body2">
        Serial {m.serial} · hour meter {m.hourMeter.toFixed(1)} h · {fuelWords(m)}
      </Typography>
      <Typography variant="body2" sx={{ color: service.status === 'ok' ? 'text.primary' : 'error.main', mt: 0.5, fontWeight: 700 }}>
        {SERVICE_WORDS[service.status]}
      </Typography>
      <Typography variant="body2">{service.reason.charAt(0).toUpperCase() + service.reason.slice(1)}.</Typography>
      <Button component={RouterLink} to={paths.motorEdit.href(motor.id)} sx={{ mt: 1, minHeight: 48 }}>
        Motor record and its moves
      </Button>
    </Box>
  );
}
