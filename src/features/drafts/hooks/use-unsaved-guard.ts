import { useEffect } from 'react';
import { useBlocker } from 'react-router';

/**
 * While there are unsaved changes, leaving the workspace asks first: inside the app through the
 * router's blocker, and on closing or reloading the tab through the browser's own prompt.
 */
export function useUnsavedGuard(dirty: boolean) {
  const blocker = useBlocker(({ currentLocation, nextLocation }) => dirty && currentLocation.pathname !== nextLocation.pathname);
  useEffect(() => {
    if (!dirty) return;
    const onBeforeUnload = (e: BeforeUnloadEvent) => {
      e.preventDefault();
    };
    window.addEventListener('beforeunload', onBeforeUnload);
    return () => window.removeEventListener('beforeunload', onBeforeUnload);
  }, [dirty]);
  return blocker;
}
