import { useCallback, useEffect, useLayoutEffect, useRef, useState } from 'react';

const ACTIVITY = ['pointerdown', 'keydown', 'wheel'] as const;

/**
 * Watches for a visitor who walked away: after `idleMs` without a touch it shows a warning that
 * counts down `warningMs`, then resets. Any touch, the warning's own button included, starts over.
 * Seconds are counted by ticks, so the countdown reads the same on a slow screen.
 */
export function useIdleReset({ enabled, idleMs, warningMs, onReset }: { enabled: boolean; idleMs: number; warningMs: number; onReset: () => void }) {
  const [secondsLeft, setSecondsLeft] = useState<number | null>(null);
  const timer = useRef<ReturnType<typeof setTimeout>>(undefined);
  const ticker = useRef<ReturnType<typeof setInterval>>(undefined);
  const resetRef = useRef(onReset);
  useLayoutEffect(() => {
    resetRef.current = onReset;
  });

  const clearTimers = useCallback(() => {
    clearTimeout(timer.current);
    clearInterval(ticker.current);
  }, []);
  const stop = useCallback(() => {
    clearTimers();
    setSecondsLeft(null);
  }, [clearTimers]);

  // Starts the idle count from now; the warning, if shown, is the caller's to hide.
  const arm = useCallback(() => {
    clearTimers();
    timer.current = setTimeout(() => {
      let left = Math.ceil(warningMs / 1000);
      setSecondsLeft(left);
      ticker.current = setInterval(() => {
        left -= 1;
        if (left > 0) return setSecondsLeft(left);
        stop();
        resetRef.current();
      }, 1000);
    }, idleMs);
  }, [idleMs, warningMs, clearTimers, stop]);
  const restart = useCallback(() => {
    arm();
    setSecondsLeft(null);
  }, [arm]);

  useEffect(() => {
    if (!enabled) return clearTimers();
    arm();
    for (const type of ACTIVITY) window.addEventListener(type, restart, { capture: true, passive: true });
    return () => {
      for (const type of ACTIVITY) window.removeEventListener(type, restart, { capture: true });
      stop();
    };
  }, [enabled, arm, restart, stop, clearTimers]);

  return { secondsLeft, stillHere: restart };
}
