import { Unavailable } from '../components/Unavailable.js';
import type { ScreenProps } from '../ScreenProps.js';

export function SearchScreen(_props: ScreenProps) {
  return <Unavailable what="Search" engine="pending" />;
}
