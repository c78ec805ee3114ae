import { useTranslation } from 'react-i18next';
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
  const { t } = useTranslation('cards');
  const matrix = useMemo(() => (encoder.status === 'ready' ? encoder.encode(url) : null), [encoder, url]);
  if (!matrix) {
    return (
      <div
        className={styles.pending}
        role="img"
        aria-label={encoder.status === 'failed' ? t('card.qrFailed', { url }) : t('card.qrDrawing')}
      />
    );
  }
  const side = matrix.size + QUIET_ZONE * 2;
  return (
    <svg
      className={styles.svg}
      viewBox={`0 0 ${side} ${side}`}
      role="img"
      aria-label={t('card.qrLink', { url })}
      data-url={url}
      shapeRendering="crispEdges"
    >
      <title>{t('card.qrLink', { url })}</title>
      <rect className={styles.light} width={side} height={side} />
      <path className={styles.dark} d={qrPathData(matrix)} />
    </svg>
  );
}
