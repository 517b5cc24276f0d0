/** Registry of CLI commands. Each command lives in its own file in this folder. */
import type { CliCommand } from '../command';
import { simulateCommand } from './simulate';
import { analyzeCommand } from './analyze';
import { fitCommand } from './fit';

export const commands: CliCommand[] = [simulateCommand, analyzeCommand, fitCommand];
