/** Every command of the command line, in the order `gradus --help` lists them. */
import type { CommandSpec } from '../command.js';
import { appCommand } from './app.js';
import { catalogueCommand } from './catalogue.js';
import { searchCommand } from './search.js';
import { exportCommand } from './export.js';
import { demoCommand } from './demo.js';
import { distCommand } from './dist.js';
import { familiesCommand } from './families.js';
import { moduleCommand } from './module.js';
import { quotientCommand } from './quotient.js';
import { qseriesCommand } from './qseries.js';
import { showCommand } from './show.js';
import { statisticsCommand } from './statistics.js';
import { symCommand } from './sym.js';
import { versionCommand } from './version.js';

export const COMMANDS: readonly CommandSpec[] = [qseriesCommand, demoCommand, versionCommand, appCommand, catalogueCommand, searchCommand, exportCommand, moduleCommand, quotientCommand, familiesCommand, showCommand, statisticsCommand, distCommand, symCommand];
