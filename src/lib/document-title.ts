import { useEffect } from 'react';

/** Sets the tab title to "<title> · Quadrant" (just "Quadrant" for undefined) while the component is shown. */
export function useDocumentTitle(title: string | undefined): void {
  useEffect(() => {
    document.title = title ? `${title} · Quadrant` : 'Quadrant';
  }, [title]);
}
