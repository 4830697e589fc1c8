/**
 * Every command of the command line, in the order `gradus --help` lists them. Each is
 * loaded only when used, so a command starts without loading the other engines.
 */
import type { CommandSpec } from '../command.js';

export interface CommandEntry {
  readonly name: string;
  load(): Promise<CommandSpec>;
}

export const COMMAND_ENTRIES: readonly CommandEntry[] = [
  { name: 'families', load: async () => (await import('./families.js')).familiesCommand },
  { name: 'show', load: async () => (await import('./show.js')).showCommand },
  { name: 'statistics', load: async () => (await import('./statistics.js')).statisticsCommand },
  { name: 'dist', load: async () => (await import('./dist.js')).distCommand },
  { name: 'sym', load: async () => (await import('./sym.js')).symCommand },
  { name: 'module', load: async () => (await import('./module.js')).moduleCommand },
  { name: 'quotient', load: async () => (await import('./quotient.js')).quotientCommand },
  { name: 'search', load: async () => (await import('./search.js')).searchCommand },
  { name: 'sweep', load: async () => (await import('./sweep.js')).sweepCommand },
  { name: 'catalogue', load: async () => (await import('./catalogue.js')).catalogueCommand },
  { name: 'cluster', load: async () => (await import('./cluster.js')).clusterCommand },
  { name: 'expressions', load: async () => (await import('./expressions.js')).expressionsCommand },
  { name: 'export', load: async () => (await import('./export.js')).exportCommand },
  { name: 'qanalog', load: async () => (await import('./qanalog.js')).qanalogCommand },
  { name: 'app', load: async () => (await import('./app.js')).appCommand },
  { name: 'demo', load: async () => (await import('./demo.js')).demoCommand },
  { name: 'version', load: async () => (await import('./version.js')).versionCommand },
];

export const COMMAND_NAMES: readonly string[] = COMMAND_ENTRIES.map((c) => c.name);

/** The command named `name`, loaded; undefined when there is none. */
export async function loadCommand(name: string): Promise<CommandSpec | undefined> {
  return COMMAND_ENTRIES.find((c) => c.name === name)?.load();
}

/** Every command, loaded (for the full help text). */
export async function loadAllCommands(): Promise<CommandSpec[]> {
  return Promise.all(COMMAND_ENTRIES.map((c) => c.load()));
}
