import { useEffect } from 'react';
import { useBlocker } from 'react-router-dom';

/**
 * Holds the reader back from losing unsaved inputs: a move to another page within the app waits
 * for them to confirm, and closing or reloading the tab asks the browser to warn.
 */
export function useUnsavedChangesGuard(dirty: boolean) {
  const blocker = useBlocker(
    ({ currentLocation, nextLocation }) =>
      dirty && currentLocation.pathname !== nextLocation.pathname,
  );
  useEffect(() => {
    const warn = (event: BeforeUnloadEvent) => {
      if (dirty) event.preventDefault();
    };
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [dirty]);
  return {
    /** Whether a move to another page waits for the reader's answer. */
    asking: blocker.state === 'blocked',
    leave: () => blocker.proceed?.(),
    stay: () => blocker.reset?.(),
  };
}
