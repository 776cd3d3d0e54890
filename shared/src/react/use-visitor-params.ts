import { useState } from 'react';

/**
 * The settings a visitor is moving in a widget, starting from `params`: new params from outside
 * (the curator's saved setting, a reset) replace what the visitor moved. The replacement is made
 * while rendering rather than in an effect, so no frame shows the old settings.
 */
export function useVisitorParams<P extends object>(params: P, onParamsChange?: (params: P) => void): [shown: P, change: (next: Partial<P>) => void] {
  const [shown, setShown] = useState(params);
  const [shownFor, setShownFor] = useState(params);
  if (shownFor !== params) {
    setShownFor(params);
    setShown(params);
  }
  const change = (next: Partial<P>) => {
    const updated = { ...shown, ...next };
    setShown(updated);
    onParamsChange?.(updated);
  };
  return [shown, change];
}
