import { useEffect } from 'react';

/** The browser tab's words for a page: its own name first, so tabs and history tell pages apart. */
export function pageTitle(title: string): string {
  return `${title} · Seamwright`;
}

/** Sets `<title>` while the page is shown (WCAG 2.4.2); each page's heading component calls it. */
export function useDocumentTitle(title: string): void {
  useEffect(() => {
    document.title = pageTitle(title);
  }, [title]);
}
