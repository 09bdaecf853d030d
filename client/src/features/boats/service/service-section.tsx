import { useState } from 'react';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import { kindSpec, roleAtLeast, utcToLocal } from '@breakline/sync-protocol';
import type { LocalRecord } from '@/db/types';
import { useSession } from '@/features/auth/use-auth';
import { SectionCard } from '../components/section-card';
import { useNow } from '../hooks/use-now';
import { motorService, servicesOf, type ServiceSources } from './motor-service';
import { ServiceForm } from './service-form';
import { ServiceHistory } from './service-history';
import { ServiceStateLine } from './service-state-line';
import { dayWords, dueWords, forecastWords } from './service-words';

/** A motor's service: where it stands, when the next falls due, recording one, and the history. */
export function ServiceSection({ motor, sources }: { motor: LocalRecord<'motor'>; sources: ServiceSources }) {
  const { activeClub } = useSession();
  const now = useNow();
  const [recording, setRecording] = useState(false);
  const zone = activeClub.timeZone;
  const service = motorService(motor, sources, now, zone);
  const forecast = forecastWords(service);
  const mayRecord = roleAtLeast(activeClub.role, kindSpec('serviceRecord').access.create);
  const last = service.last;
  return (
    <SectionCard title="Service">
      <ServiceStateLine status={service.status} />
      <Typography>{dueWords(service)}</Typography>
      {forecast && <Typography variant="body2">{forecast}</Typography>}
      <Typography variant="body2">
        {last ? `Last service ${dayWords(last.date)} at ${last.hours.toFixed(1)} h` : 'No service recorded yet'} · hour meter now {service.hourMeter.toFixed(1)} h
      </Typography>
      {service.status === 'overdue' && (
        <Typography variant="body2">A motor past its service limits the boat it is fitted to until the service is recorded.</Typography>
      )}
      <Alert severity="info" variant="outlined">
        Follow the manufacturer’s service schedule and manual. Work on the fuel system or the propeller only with the motor off and the kill cord removed.
      </Alert>
      {mayRecord && !recording && (
        <Button variant="outlined" size="large" onClick={() => setRecording(true)}>Record a service</Button>
      )}
      {mayRecord && recording && (
        <ServiceForm
          motorId={motor.id}
          today={utcToLocal(now, zone).date}
          zone={zone}
          hourMeter={service.hourMeter}
          last={last}
          onDone={() => setRecording(false)}
        />
      )}
      <Typography variant="subtitle1" component="h3" sx={{ fontWeight: 700, mt: 1 }}>Service history</Typography>
      <ServiceHistory records={servicesOf(motor.id, sources.serviceRecords)} zone={zone} />
    </SectionCard>
  );
}
