/** Small shared hooks. */
import { useEffect, useState } from 'react';

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
