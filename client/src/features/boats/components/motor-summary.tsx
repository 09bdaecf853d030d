import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/app/paths';
import type { LocalRecord } from '@/db/types';
import { motorService, type ServiceSources } from '../service/motor-service';
import { ServiceStateLine } from '../service/service-state-line';
import type { ReadinessContext } from '../readiness/adapt';

const fuelWords = (m: LocalRecord<'motor'>['fields']) =>
  m.fuelMode === 'oil-injection' ? 'oil injection' : `premix ${m.premixRatio ?? '?'}:1 (petrol to oil, from the motor's manual)`;

/** The motor fitted now and where it stands for service. */
export function MotorSummary(props: { motor: LocalRecord<'motor'>; sources: ServiceSources; ctx: ReadinessContext }) {
  const { motor, sources, ctx } = props;
  const m = motor.fields;
  const service = motorService(motor, sources, ctx.now, ctx.zone);
  return (
    <Box>
      <Typography sx={{ fontWeight: 700 }}>
        {m.model}, {m.powerHp} hp
      </Typography>
      <Typography variant="body2">
        Serial {m.serial} · hour meter {service.hourMeter.toFixed(1)} h · {fuelWords(m)}
      </Typography>
      <ServiceStateLine status={service.status} />
      <Typography variant="body2">{service.reason.charAt(0).toUpperCase() + service.reason.slice(1)}.</Typography>
      <Button component={RouterLink} to={paths.motorEdit.href(motor.id)} sx={{ mt: 1, minHeight: 48 }}>
        Motor record and its moves
      </Button>
    </Box>
  );
}
