import type { Command } from './command.ts';
import { inspectCommand } from './commands/inspect.ts';

/** Every `coppice` verb. Add a command by writing `commands/<verb>.ts` and listing it here. */
export const commands: readonly Command[] = [inspectCommand];
