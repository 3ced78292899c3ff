import { useEffect, useRef } from 'react';
import { useLocation } from 'react-router-dom';

/**
 * After moving to another page, focus goes to the new page's main heading (every page's h1 has
 * tabIndex -1), so keyboard and screen-reader users start at the top of what changed instead
 * of on a link that is no longer there. Changes of the query string alone (search, paging)
 * keep focus where it is, and the first load leaves it to the browser. A link to a part of a
 * page (`/settings#team`) scrolls that part into view; focus still starts at the heading.
 */
export function FocusOnNavigate() {
  const { pathname, hash } = useLocation();
  const shownPath = useRef(pathname);

  useEffect(() => {
    if (shownPath.current === pathname) return;
    shownPath.current = pathname;
    const heading = document.querySelector<HTMLElement>('main h1') ?? document.querySelector('h1');
    const part = hash ? document.getElementById(hash.slice(1)) : null;
    (heading ?? document.querySelector<HTMLElement>('main'))?.focus({ preventScroll: !!part });
    part?.scrollIntoView();
  }, [pathname, hash]);

  return null;
}
