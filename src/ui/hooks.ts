/** Small shared hooks. */
import { useInput, type Key } from 'ink';
import { useCallback, useEffect, useRef, useState } from 'react';

/** Re-render every `ms` while `on` (a clock for elapsed times and estimates). */
export function useTicker(on: boolean, ms = 250): number {
  const [now, setNow] = useState(Date.now());
  useEffect(() => {
    if (!on) return;
    const id = setInterval(() => setNow(Date.now()), ms);
    return () => clearInterval(id);
  }, [on, ms]);
  return now;
}

let keyErrorListener: (e: unknown) => void = () => {};

/** Where errors thrown by key handlers go (the app shows them on its status line). */
export function setKeyErrorListener(f: (e: unknown) => void): void {
  keyErrorListener = f;
}

/**
 * useInput whose handler and active flag are always those of the latest render. ink
 * re-subscribes a changed handler (or active flag) only after React's effects run, so a
 * key arriving just after a redraw would otherwise meet the previous render's state.
 */
export function useKeys(handler: (input: string, key: Key) => void, isActive: boolean): void {
  const latest = useRef({ handler, isActive });
  latest.current = { handler, isActive };
  const stable = useCallback((input: string, key: Key) => {
    if (!latest.current.isActive) return;
    try {
      latest.current.handler(input, key);
    } catch (e) {
      // A key handler that throws (an engine called synchronously) must not end the app.
      keyErrorListener(e);
    }
  }, []);
  useInput(stable);
}
