import type { Command } from './command.ts';
import { inspectCommand } from './commands/inspect.ts';
import { expandCommand } from './commands/expand.ts';

/** Every `coppice` verb. Add a command by writing `commands/<verb>.ts` and listing it here. */
export const commands: readonly Command[] = [inspectCommand, expandCommand];
