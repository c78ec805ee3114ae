import { useEffect } from 'react';

/** Names the browser tab after the page, so history and screen readers tell pages apart. */
export function useDocumentTitle(title: string | null): void {
  useEffect(() => {
    document.title = title ? `${title} · Homeground` : 'Homeground';
  }, [title]);
}
