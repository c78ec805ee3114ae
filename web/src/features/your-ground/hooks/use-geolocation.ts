import { useCallback, useState } from 'react';

export type GeolocationState =
  | { status: 'idle' }
  | { status: 'locating' }
  | { status: 'found'; lat: number; lon: number }
  | { status: 'failed'; message: string };

/** GeolocationPositionError codes (W3C Geolocation API): 1 denied, 2 unavailable, 3 timeout. */
const FAILURE_WORDS: Record<number, string> = {
  1: 'Homeground was not allowed to use your location. Enter your ZIP code or click the map instead.',
  2: 'Your device could not tell where it is right now. Enter your ZIP code or click the map instead.',
  3: 'Finding your location took too long. Try again, or enter your ZIP code.',
};

/** "Use my location": asks the browser once, only when the person presses the button. */
export function useGeolocation() {
  const [state, setState] = useState<GeolocationState>({ status: 'idle' });
  const locate = useCallback(() => {
    if (typeof navigator === 'undefined' || !navigator.geolocation) {
      setState({
        status: 'failed',
        message: 'This browser cannot share your location. Enter your ZIP code or click the map instead.',
      });
      return;
    }
    setState({ status: 'locating' });
    navigator.geolocation.getCurrentPosition(
      (pos) => setState({ status: 'found', lat: round(pos.coords.latitude), lon: round(pos.coords.longitude) }),
      (err) => setState({ status: 'failed', message: FAILURE_WORDS[err.code] ?? FAILURE_WORDS[2] }),
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
