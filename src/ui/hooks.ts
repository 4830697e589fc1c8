/** Small shared hooks. */
import { useContext, useEffect, useRef, useState } from 'react';
import type { KeyHandler, KeyEntry } from './keys/keyBus.js';
import { KeysContext } from './keys/KeysContext.js';

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

export interface KeyOptions {
  /** The shell's own keys: handled before any screen's, and may take the key (return true). */
  readonly global?: boolean;
  /** A text field: while active, pasted text reaches it whole. */
  readonly text?: boolean;
}

/**
 * Keys for a component, through the app's one key queue (keys/keyBus.ts): the handler and
 * active flag of the latest render are used, and each key is handled only once the previous
 * one has been drawn, so keys sent together act as keys typed one by one.
 */
export function useKeys(handler: KeyHandler, isActive: boolean, options: KeyOptions = {}): void {
  const bus = useContext(KeysContext);
  bus.renders++;
  const entry = useRef<KeyEntry | undefined>(undefined);
  entry.current ??= { handler, active: isActive, global: options.global ?? false, text: options.text ?? false };
  entry.current.handler = handler;
  entry.current.active = isActive;
  useEffect(() => bus.register(entry.current!), [bus]);
}
