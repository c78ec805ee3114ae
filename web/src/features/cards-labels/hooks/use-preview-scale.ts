import { type RefObject, useEffect, useState } from 'react';

/** The zoom that fits a real-size page preview into its container (never above 1). */
export function usePreviewScale(ref: RefObject<HTMLElement | null>, pageWidthPx: number): number {
  const [scale, setScale] = useState(1);
  useEffect(() => {
    const el = ref.current;
    if (!el || typeof ResizeObserver === 'undefined') return;
    const update = () => {
      const width = el.clientWidth;
      if (width > 0) setScale(Math.min(1, width / pageWidthPx));
    };
    update();
    const observer = new ResizeObserver(update);
    observer.observe(el);
    return () => observer.disconnect();
  }, [ref, pageWidthPx]);
  return scale;
}
