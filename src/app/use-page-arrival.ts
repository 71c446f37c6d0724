import { useEffect, useRef } from 'react';
import { useLocation, useNavigation } from 'react-router-dom';

const APP_NAME = 'Dwell';

/**
 * The document title of the page in `main`: its heading, and the current tab of a page that has its own navigation
 * (the set-up pages share the heading "Set-up"), e.g. "Staff · Set-up · Dwell".
 */
export function pageTitleOf(main: HTMLElement, heading: HTMLElement): string {
  const tab = main.querySelector('nav [aria-current="page"]')?.textContent?.trim();
  const name = heading.textContent?.trim();
  return [tab, name, APP_NAME].filter(Boolean).join(' · ');
}

/**
 * Arriving on a page: the browser tab and history take the page's title, and after a move to another page (not on
 * the first load, not when only the query changes, e.g. the next day of the book) keyboard focus goes to the page's
 * heading, so a screen reader reads where the person now is and Tab continues from there. A heading that appears
 * only once its data has loaded is waited for.
 */
export function usePageArrival(): void {
  const { pathname, search } = useLocation();
  const settled = useNavigation().state === 'idle';
  const shownPath = useRef<string | null>(null);
  useEffect(() => {
    const main = document.getElementById('main');
    if (!settled || !main) return;
    const moved = shownPath.current !== null && shownPath.current !== pathname;
    shownPath.current = pathname;
    const arrive = () => {
      const heading = main.querySelector('h1');
      if (!heading) return false;
      document.title = pageTitleOf(main, heading);
      if (moved) {
        heading.tabIndex = -1;
        heading.focus({ preventScroll: true });
      }
      return true;
    };
    if (arrive()) return;
    const watch = new MutationObserver(() => arrive() && watch.disconnect());
    watch.observe(main, { childList: true, subtree: true, characterData: true });
    return () => watch.disconnect();
  }, [pathname, search, settled]);
}
