import type { Command } from './command.ts';
import './canon-hooks.ts';
import { isoCommand } from './commands/iso.ts';
import { inspectCommand } from './commands/inspect.ts';
import { expandCommand } from './commands/expand.ts';
import { periodCommand } from './commands/period.ts';
import { coproductCommand } from './commands/coproduct.ts';
import { countertermCommand } from './commands/counterterm.ts';
import { generateCommand } from './commands/generate.ts';
import { rgCommand } from './commands/rg.ts';

/** Every `coppice` verb. Add a command by writing `commands/<verb>.ts` and listing it here. */
export const commands: readonly Command[] = [inspectCommand, expandCommand, periodCommand, coproductCommand, countertermCommand, isoCommand, generateCommand, rgCommand];
