import { useState } from 'react';
import type { Place } from '../model/incident-draft';

export type LocationAsk = { state: 'idle' } | { state: 'asking' } | { state: 'failed'; message: string };

function failure(error: GeolocationPositionError): string {
  if (error.code === error.PERMISSION_DENIED) return 'Location was not allowed on this phone, so none is saved. Describe the place in the notes instead.';
  if (error.code === error.TIMEOUT) return 'The phone could not find its position in time. Try again in the open, or describe the place in the notes.';
  return 'The phone could not give its position. Describe the place in the notes instead.';
}

/** Asks the phone once for its position, only when the person taps for it. */
export function usePhoneLocation(onPlace: (p: Place) => void) {
  const [ask, setAsk] = useState<LocationAsk>({ state: 'idle' });
  function locate() {
    if (typeof navigator === 'undefined' || !navigator.geolocation) {
      setAsk({ state: 'failed', message: 'This browser cannot give the phone\'s position. Describe the place in the notes instead.' });
      return;
    }
    setAsk({ state: 'asking' });
    navigator.geolocation.getCurrentPosition(
      (pos) => {
        setAsk({ state: 'idle' });
        onPlace({ lat: pos.coords.latitude, lon: pos.coords.longitude, accuracyM: Number.isFinite(pos.coords.accuracy) ? pos.coords.accuracy : null });
      },
      (error) => setAsk({ state: 'failed', message: failure(error) }),
      { enableHighAccuracy: true, timeout: 20_000, maximumAge: 60_000 },
    );
  }
  return { ask, locate };
}
