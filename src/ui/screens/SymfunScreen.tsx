import { Unavailable } from '../components/Unavailable.js';
import type { ScreenProps } from '../ScreenProps.js';

export function SymfunScreen(_props: ScreenProps) {
  return <Unavailable what="Symfun" engine="pending" />;
}
