import { type RefObject, useEffect, useState } from 'react';

/**
 * The projector view of an element: larger type, and full screen where the browser allows.
 * Leaving full screen (Esc) leaves the projector view too.
 */
export function useProjector(frame: RefObject<HTMLElement | null>) {
  const [projector, setProjector] = useState(false);

  const present = async () => {
    const element = frame.current;
    if (!element) return;
    if (projector) {
      setProjector(false);
      if (document.fullscreenElement) await document.exitFullscreen().catch(() => undefined);
      return;
    }
    setProjector(true);
    element.focus();
    await element.requestFullscreen?.().catch(() => undefined);
  };

  useEffect(() => {
    const left = () => {
      if (!document.fullscreenElement) setProjector(false);
    };
    document.addEventListener('fullscreenchange', left);
    return () => document.removeEventListener('fullscreenchange', left);
  }, []);

  return { projector, present };
}
