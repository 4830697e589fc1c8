/** The user's catalogue when there is one (the app keeps computed results there, but never creates it as a side effect). */
import { existsSync } from 'node:fs';
import { cataloguePath } from '../../store/cataloguePath.js';

export function existingCatalogue(env: Readonly<Record<string, string | undefined>>, cwd: string): string | undefined {
  const path = cataloguePath(undefined, env, cwd);
  return existsSync(path) ? path : undefined;
}
