import { type RefObject, useEffect, useLayoutEffect, useState } from 'react';

/**
 * How many steps to shrink a fixed-size printed card's text so nothing is cut off: a card's
 * size is set by the paper, but a species with long cautions has more to say. Starts at 0 and
 * steps up while the element's content overflows it, to at most `maxLevel`.
 */
export function useFitLevel(ref: RefObject<HTMLElement | null>, maxLevel: number, resetKey: string): number {
  const [level, setLevel] = useState(0);
  const [fontsSettled, setFontsSettled] = useState(0);

  useLayoutEffect(() => setLevel(0), [resetKey, fontsSettled]);

  useLayoutEffect(() => {
    const el = ref.current;
    if (!el || level >= maxLevel) return;
    if (el.scrollHeight > el.clientHeight + 1) setLevel(level + 1);
  }, [ref, level, maxLevel, resetKey, fontsSettled]);

  // Web fonts arriving change line lengths; measure again once they have.
  useEffect(() => {
    let live = true;
    document.fonts?.ready.then(() => live && setFontsSettled((n) => n + 1));
    return () => {
      live = false;
    };
  }, []);

  return level;
}
