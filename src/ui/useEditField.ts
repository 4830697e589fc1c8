/**
 * Which text field of a screen is being edited (or none). Tells the shell (for the help
 * line), and drops the field when the screen is left.
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
  const set = useCallback(
    (f: F | undefined) => {
      setField(f);
      setEditing(f !== undefined);
    },
    [setEditing],
  );
  useEffect(() => {
    if (active) setEditing(field !== undefined);
  }, [active, field, setEditing]);
  return [field, set];
}
