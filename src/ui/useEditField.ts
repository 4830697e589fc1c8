/**
 * Which text field of a screen is being edited (or none). Tells the shell, so global keys
 * stay out of the way while typing, and drops the field when the screen is left.
 */
import { useCallback, useEffect, useState } from 'react';

export function useEditField<F extends string>(
  active: boolean,
  setEditing: (e: boolean) => void,
): [F | undefined, (f: F | undefined) => void] {
  const [field, setField] = useState<F | undefined>(undefined);
  useEffect(() => {
    if (!active) setField(undefined);
  }, [active]);
  useEffect(() => {
    if (active) setEditing(field !== undefined);
  }, [active, field, setEditing]);
  const set = useCallback((f: F | undefined) => setField(f), []);
  return [field, set];
}
