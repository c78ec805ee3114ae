import { useCallback, useState } from 'react';

export type GeolocationState =
  | { status: 'idle' }
  | { status: 'locating' }
  | { status: 'found'; lat: number; lon: number }
  | { status: 'failed'; reason: GeolocationFailure };

/** Why no position came back; the page says each in words. */
export type GeolocationFailure = 'denied' | 'unavailable' | 'timeout' | 'unsupported';

/** GeolocationPositionError codes (W3C Geolocation API): 1 denied, 2 unavailable, 3 timeout. */
const FAILURES: Record<number, GeolocationFailure> = { 1: 'denied', 2: 'unavailable', 3: 'timeout' };

/** "Use my location": asks the browser once, only when the person presses the button. */
export function useGeolocation() {
  const [state, setState] = useState<GeolocationState>({ status: 'idle' });
  const locate = useCallback(() => {
    if (typeof navigator === 'undefined' || !navigator.geolocation) {
      setState({ status: 'failed', reason: 'unsupported' });
      return;
    }
    setState({ status: 'locating' });
    navigator.geolocation.getCurrentPosition(
      (pos) => setState({ status: 'found', lat: round(pos.coords.latitude), lon: round(pos.coords.longitude) }),
      (err) => setState({ status: 'failed', reason: FAILURES[err.code] ?? 'unavailable' }),
      // A coarse fix is enough to find a county; it is faster and kinder to the battery.
      { enableHighAccuracy: false, timeout: 15_000, maximumAge: 10 * 60_000 },
    );
  }, []);
  return { state, locate };
}

/** Four decimals is about 11 m: plenty for a county, and no more precise than needed. */
function round(value: number): number {
  return Math.round(value * 10_000) / 10_000;
}
