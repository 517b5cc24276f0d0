/** The shape every CLI command file exports. */
export interface CliIo {
  stdout: (text: string) => void;
  stderr: (text: string) => void;
}

export interface CliCommand {
  name: string;
  /** One line for the tool's --help. */
  summary: string;
  /** Full text for `<command> --help`. */
  help: string;
  /** Returns the exit code. Throws UsageError for bad arguments or unreadable input. */
  run: (argv: string[], io: CliIo) => Promise<number>;
}
