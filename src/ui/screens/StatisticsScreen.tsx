import { Unavailable } from '../components/Unavailable.js';
import type { ScreenProps } from '../ScreenProps.js';

export function StatisticsScreen(_props: ScreenProps) {
  return <Unavailable what="Statistics" engine="pending" />;
}
