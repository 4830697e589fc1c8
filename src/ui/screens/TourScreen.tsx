import { Unavailable } from '../components/Unavailable.js';
import type { ScreenProps } from '../ScreenProps.js';

export function TourScreen(_props: ScreenProps) {
  return <Unavailable what="Tour" engine="pending" />;
}
