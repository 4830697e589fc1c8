/** The checks reported with a module, one line each: holds, fails (with where), or n/a. */
import { Box, Text } from 'ink';
import type { ModuleFinding } from '../engines/moduleTypes.js';
import { useTheme } from '../ThemeContext.js';

export function ModuleFindings({ findings, width }: { readonly findings: readonly ModuleFinding[]; readonly width: number }) {
  const theme = useTheme();
  return (
    <Box flexDirection="column" width={width}>
      {findings.map((f, i) => (
        <Text key={i} wrap="truncate">
          <Text {...theme.style(f.holds === true ? 'ok' : f.holds === false ? 'warn' : 'dim')}>
            {f.holds === true ? '✓ holds ' : f.holds === false ? '✗ fails ' : '· n/a   '}
          </Text>
          {f.label}
          {f.detail ? <Text {...theme.style('dim')}> — {f.detail}</Text> : null}
        </Text>
      ))}
    </Box>
  );
}
