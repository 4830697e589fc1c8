import { Unavailable } from '../components/Unavailable.js';
import type { ScreenProps } from '../ScreenProps.js';

export function FamiliesScreen(_props: ScreenProps) {
  return <Unavailable what="Families" engine="pending" />;
}
