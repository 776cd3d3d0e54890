import { useEffect, useState } from 'react';

const QUERY = '(prefers-reduced-motion: reduce)';

/** The visitor's reduced-motion choice: the kiosk's own toggle when given, else the system setting. */
export function useReducedMotion(override?: boolean): boolean {
  const [system, setSystem] = useState(() => typeof window !== 'undefined' && typeof window.matchMedia === 'function' && window.matchMedia(QUERY).matches);
  useEffect(() => {
    if (typeof window.matchMedia !== 'function') return undefined;
    const media = window.matchMedia(QUERY);
    const update = () => setSystem(media.matches);
    media.addEventListener('change', update);
    return () => media.removeEventListener('change', update);
  }, []);
  return override ?? system;
}
