import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Typography from '@mui/material/Typography';
import { usePhoneLocation } from '../hooks/use-phone-location';
import type { Place } from '../model/incident-draft';
import { latLonText } from '../model/place-text';


/** Where it happened: the phone's position, only when the person taps for it and allows it. */
export function PlaceField({ place, onChange }: { place: Place | null; onChange: (p: Place | null) => void }) {
  const { ask, locate } = usePhoneLocation(onChange);
  return (
    <Box component="section" aria-label="Place" sx={{ display: 'grid', gap: 1 }}>
      <Typography sx={{ fontWeight: 700 }}>Where</Typography>
      {place ? (
        <>
          <Typography>{latLonText(place.lat, place.lon)}</Typography>
          <Typography variant="body2" sx={{ color: 'text.secondary' }}>
            WGS 84 latitude and longitude as the phone's location service gave them
            {place.accuracyM !== null ? `, to within about ${Math.round(place.accuracyM)} m` : ''}. Where the phone was when you tapped, which may not be exactly where it happened.
          </Typography>
          <Button onClick={() => onChange(null)}>Remove the location</Button>
        </>
      ) : (
        <Button variant="outlined" size="large" onClick={locate} disabled={ask.state === 'asking'}>
          {ask.state === 'asking' ? 'Finding the phone\'s position…' : 'Add this phone\'s location'}
        </Button>
      )}
      {ask.state === 'failed' && <Alert severity="warning">{ask.message}</Alert>}
    </Box>
  );
}
