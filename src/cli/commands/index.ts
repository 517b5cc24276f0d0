/** Registry of CLI commands. Each command lives in its own file in this folder. */
import type { CliCommand } from '../command';

export const commands: CliCommand[] = [];
