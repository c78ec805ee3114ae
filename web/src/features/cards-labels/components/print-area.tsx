import { makeStyles, mergeClasses, tokens } from '@fluentui/react-components';
import { type CSSProperties, type ReactNode, useRef } from 'react';
import { usePreviewScale } from '../hooks/use-preview-scale.js';
import type { SheetGeometry } from '../utils/paper-sizes.js';
import './print-sheets.css';

/** Gap between pages in the on-screen preview, in CSS px. */
const PREVIEW_GAP_PX = 24;

const useStyles = makeStyles({
  frame: { width: '100%', overflow: 'hidden' },
  // Centred at full size; when scaled down the page is wider than the frame, so the auto margins fall to 0.
  area: { transformOrigin: 'top left', width: 'max-content', marginLeft: 'auto', marginRight: 'auto' },
  sheet: {
    boxSizing: 'border-box',
    backgroundColor: tokens.colorNeutralBackground1,
    boxShadow: tokens.shadow8,
    marginBottom: `${PREVIEW_GAP_PX}px`,
  },
});

function cssPx(length: string): number {
  const value = parseFloat(length);
  return length.endsWith('mm') ? (value / 25.4) * 96 : value * 96;
}

/**
 * The pages exactly as they print, shrunk with a transform to fit a phone; the print stylesheet
 * (print-sheets.css) shows only this area on paper, one `.hg-sheet` per page.
 */
export function PrintArea({
  geometry,
  pageCount,
  label,
  children,
}: {
  geometry: SheetGeometry;
  pageCount: number;
  label: string;
  children: ReactNode;
}) {
  const styles = useStyles();
  const frameRef = useRef<HTMLDivElement>(null);
  const scale = usePreviewScale(frameRef, geometry.pageWidthPx);
  const fullHeight = pageCount * (cssPx(geometry.pageHeight) + PREVIEW_GAP_PX);
  const style: CSSProperties = { transform: scale < 1 ? `scale(${scale})` : undefined };
  return (
    <div
      ref={frameRef}
      className={styles.frame}
      style={{ height: scale < 1 ? `${Math.ceil(fullHeight * scale)}px` : undefined }}
    >
      <div className={mergeClasses('hg-print-area', styles.area)} style={style} role="region" aria-label={label}>
        {children}
      </div>
    </div>
  );
}

/** One printed page; on screen a sheet of paper with the page margin around its content. */
export function Sheet({
  geometry,
  index,
  total,
  className,
  children,
}: {
  geometry: SheetGeometry;
  index: number;
  total: number;
  className?: string;
  children: ReactNode;
}) {
  const styles = useStyles();
  return (
    <div
      className={mergeClasses('hg-sheet', styles.sheet)}
      style={{ width: geometry.pageWidth, height: geometry.pageHeight, padding: geometry.margin }}
      role="group"
      aria-label={`Page ${index + 1} of ${total}`}
    >
      <div className={className} style={{ width: geometry.innerWidth, height: geometry.innerHeight }}>
        {children}
      </div>
    </div>
  );
}
