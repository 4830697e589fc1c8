import { Unavailable } from '../components/Unavailable.js';
import type { ScreenProps } from '../ScreenProps.js';

export function ExportScreen(_props: ScreenProps) {
  return <Unavailable what="Export" engine="pending" />;
}
