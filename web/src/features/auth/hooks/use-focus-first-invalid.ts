import { useEffect, useRef, useState } from 'react';

/**
 * After a rejected submit, moves focus to the first input marked invalid, so keyboard and
 * screen-reader users land on the problem instead of hunting for it.
 */
export function useFocusFirstInvalid<T extends HTMLElement>() {
  const formRef = useRef<T>(null);
  const [attempt, setAttempt] = useState(0);
  useEffect(() => {
    if (attempt === 0) return;
    formRef.current?.querySelector<HTMLElement>('[aria-invalid="true"]')?.focus();
  }, [attempt]);
  return { formRef, focusFirstInvalid: () => setAttempt((n) => n + 1) };
}
