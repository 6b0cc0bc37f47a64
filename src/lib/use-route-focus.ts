import { useEffect, useRef, type RefObject } from 'react';
import { useLocation } from 'react-router';

/**
 * After a client-side navigation, moves keyboard and screen-reader focus to the new page (or to
 * the element named by the address's #hash) instead of leaving it where the old page's link
 * was. The first load keeps the browser's own behaviour.
 *
 * @param main the page's main region; it needs tabIndex={-1} to take focus.
 */
export function useRouteFocus(main: RefObject<HTMLElement | null>): void {
  const { pathname, hash } = useLocation();
  const firstRender = useRef(true);
  useEffect(() => {
    if (firstRender.current) {
      firstRender.current = false;
      return;
    }
    const named = hash ? document.getElementById(decodeURIComponent(hash.slice(1))) : null;
    const target = named ?? main.current;
    if (!target) return;
    if (!target.hasAttribute('tabindex')) target.setAttribute('tabindex', '-1');
    target.focus({ preventScroll: true });
    target.scrollIntoView({ block: 'start' });
  }, [pathname, hash, main]);
}
