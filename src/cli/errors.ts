/** A bad argument or unreadable input: the CLI prints one line and exits with code 2. */
export class UsageError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'UsageError';
  }
}
