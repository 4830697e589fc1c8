/**
 * Where the catalogue lives: --catalogue PATH, else $GRADUS_CATALOGUE, else
 * $XDG_DATA_HOME/gradus/catalogue.sqlite, else ~/.local/share/gradus/catalogue.sqlite.
 */
import { homedir } from 'node:os';
import { isAbsolute, join, resolve } from 'node:path';

export function cataloguePath(option: string | undefined, env: Readonly<Record<string, string | undefined>>, cwd: string): string {
  const given = option ?? env['GRADUS_CATALOGUE'];
  if (given !== undefined && given !== '') return isAbsolute(given) ? given : resolve(cwd, given);
  const xdg = env['XDG_DATA_HOME'];
  const base = xdg && isAbsolute(xdg) ? xdg : join(env['HOME'] ?? homedir(), '.local', 'share');
  return join(base, 'gradus', 'catalogue.sqlite');
}
