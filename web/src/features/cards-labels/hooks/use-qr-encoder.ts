import { useEffect, useState } from 'react';
import { loadQrEncoder, type QrEncoder } from '../utils/qr-matrix.js';

export type QrEncoderState = { status: 'loading' } | { status: 'ready'; encode: QrEncoder } | { status: 'failed' };

/** Loads the QR encoder once for the page; cards draw a framed space until it arrives. */
export function useQrEncoder(): QrEncoderState {
  const [state, setState] = useState<QrEncoderState>({ status: 'loading' });
  useEffect(() => {
    let live = true;
    loadQrEncoder().then(
      (encode) => live && setState({ status: 'ready', encode }),
      () => live && setState({ status: 'failed' }),
    );
    return () => {
      live = false;
    };
  }, []);
  return state;
}
