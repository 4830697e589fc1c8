/** Said plainly when an engine this screen needs is not part of this build. */
import { Text } from 'ink';
import { useTheme } from '../ThemeContext.js';

export function Unavailable({ what, engine }: { readonly what: string; readonly engine: string }) {
  const theme = useTheme();
  return (
    <Text wrap="wrap" {...theme.style('warn')}>
      {what} is not available in this build: its engine ({engine}) is not part of it yet. Nothing is shown rather than
      made-up data.
    </Text>
  );
}
