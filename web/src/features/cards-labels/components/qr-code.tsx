import { makeStyles, tokens } from '@fluentui/react-components';
import { useMemo } from 'react';
import type { QrEncoderState } from '../hooks/use-qr-encoder.js';
import { QUIET_ZONE, qrPathData } from '../utils/qr-matrix.js';

const useStyles = makeStyles({
  svg: { display: 'block', width: '100%', height: 'auto' },
  light: { fill: tokens.colorNeutralBackground1 },
  dark: { fill: tokens.colorNeutralForeground1 },
  pending: { aspectRatio: '1', border: `1px dashed ${tokens.colorNeutralStroke1}` },
});

/** A scannable QR code for `url`, drawn as SVG; the link's words are its accessible name. */
export function QrCode({ url, encoder }: { url: string; encoder: QrEncoderState }) {
  const styles = useStyles();
  const matrix = useMemo(() => (encoder.status === 'ready' ? encoder.encode(url) : null), [encoder, url]);
  if (!matrix) {
    return (
      <div
        className={styles.pending}
        role="img"
        aria-label={encoder.status === 'failed' ? `QR code could not be drawn; link: ${url}` : 'Drawing the QR code'}
      />
    );
  }
  const side = matrix.size + QUIET_ZONE * 2;
  return (
    <svg
      className={styles.svg}
      viewBox={`0 0 ${side} ${side}`}
      role="img"
      aria-label={`QR code linking to ${url}`}
      data-url={url}
      shapeRendering="crispEdges"
    >
      <title>{`QR code linking to ${url}`}</title>
      <rect className={styles.light} width={side} height={side} />
      <path className={styles.dark} d={qrPathData(matrix)} />
    </svg>
  );
}
