/**
 * Lines of styled text, each exactly as given: the screens wrap and window their text
 * themselves (src/ui/text), so nothing here is cut by the layout. A line that is still too
 * wide ends in … (ink's truncation) rather than running off the edge.
 */
import { Box, Text } from 'ink';
import type { SLine } from '../text/styledLine.js';
import { useTheme } from '../ThemeContext.js';

export function Lines({ lines }: { readonly lines: readonly SLine[] }) {
  const theme = useTheme();
  return (
    <Box flexDirection="column">
      {lines.map((l, i) => (
        <Text key={i} wrap="truncate">
          {l.length === 0
            ? ' '
            : l.map((s, j) => (
                <Text key={j} {...(s.style ? theme.style(s.style) : {})}>
                  {s.text}
                </Text>
              ))}
        </Text>
      ))}
    </Box>
  );
}
