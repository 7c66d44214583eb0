import { useEffect } from 'react';

/** Sets the browser tab's title for the screen ("Users · Gridkeep"). */
export function useDocumentTitle(title: string | undefined) {
  useEffect(() => {
    document.title = title ? `${title} · Gridkeep` : 'Gridkeep';
  }, [title]);
}
