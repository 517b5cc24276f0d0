/**
 * Halfwave command line. Results go to stdout alone; an error is one plain line on stderr with
 * exit code 2 (bad arguments or unreadable input) or 1 (internal fault). `--debug` adds the stack.
 */
import { AnalysisError } from '../core/errors';
import type { CliCommand, CliIo } from './command';
import { commands } from './commands';
import { UsageError } from './errors';

const TOOL_HELP = (list: CliCommand[]) => `halfwave: cyclic-voltammetry analysis from the command line

Usage: halfwave <command> [options]      (from the repository: npm run --silent cli -- <command> ...)

Commands:
${list.map((c) => `  ${c.name.padEnd(10)} ${c.summary}`).join('\n')}

Run 'halfwave <command> --help' for the options of one command.
Global option: --debug  print the stack trace of an error.
`;

export async function runCli(argv: string[], io: CliIo): Promise<number> {
  const debug = argv.includes('--debug');
  const args = argv.filter((a) => a !== '--debug');
  const [name, ...rest] = args;
  if (!name || name === '--help' || name === '-h' || name === 'help') {
    io.stdout(TOOL_HELP(commands));
    return name ? 0 : 2;
  }
  const command = commands.find((c) => c.name === name);
  if (!command) {
    io.stderr(`halfwave: unknown command "${name}" (try --help)\n`);
    return 2;
  }
  if (rest.includes('--help') || rest.includes('-h')) {
    io.stdout(command.help);
    return 0;
  }
  try {
    return await command.run(rest, io);
  } catch (err) {
    return reportError(err, name, debug, io);
  }
}

function reportError(err: unknown, command: string, debug: boolean, io: CliIo): number {
  const e = err instanceof Error ? err : new Error(String(err));
  // An ImportError is bad input unless the importer itself reports an internal fault.
  const importCode = e.name === 'ImportError' ? (e as Error & { code?: string }).code : undefined;
  const isInput = err instanceof UsageError || err instanceof AnalysisError || (importCode !== undefined && importCode !== 'INTERNAL');
  io.stderr(`halfwave ${command}: ${isInput ? '' : 'internal error: '}${e.message.split('\n')[0]}\n`);
  if (debug && e.stack) io.stderr(`${e.stack}\n`);
  return isInput ? 2 : 1;
}

const isMain = typeof process !== 'undefined' && process.argv[1] && /main\.(ts|js|mjs)$/.test(process.argv[1]);
if (isMain) {
  runCli(process.argv.slice(2), {
    stdout: (t) => process.stdout.write(t),
    stderr: (t) => process.stderr.write(t),
  }).then(
    (code) => {
      process.exitCode = code;
    },
    (err: unknown) => {
      process.stderr.write(`halfwave: internal error: ${String(err)}\n`);
      process.exitCode = 1;
    },
  );
}
