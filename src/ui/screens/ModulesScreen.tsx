import { Unavailable } from '../components/Unavailable.js';
import type { ScreenProps } from '../ScreenProps.js';

export function ModulesScreen(_props: ScreenProps) {
  return <Unavailable what="Modules" engine="pending" />;
}
