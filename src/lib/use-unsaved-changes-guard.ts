import { useEffect } from 'react';
import { useBlocker } from 'react-router-dom';

export const UNSAVED_QUESTION = 'You have answers that are not saved yet. Leave this page without saving them?';

/**
 * Asks before the person leaves a form with unsaved answers: a page inside the app (through the router)
 * or the tab itself (reload, close, another address; the browser shows its own wording then).
 */
export function useUnsavedChangesGuard(unsaved: boolean): void {
  const blocker = useBlocker(({ currentLocation, nextLocation }) => unsaved && currentLocation.pathname !== nextLocation.pathname);
  useEffect(() => {
    if (blocker.state !== 'blocked') return;
    if (window.confirm(UNSAVED_QUESTION)) blocker.proceed();
    else blocker.reset();
  }, [blocker]);
  useEffect(() => {
    if (!unsaved) return;
    const warn = (e: BeforeUnloadEvent) => e.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [unsaved]);
}
