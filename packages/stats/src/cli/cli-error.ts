/**
 * A problem the command line reports as one line on stderr, with its exit code:
 * 1 for bad input data, 2 for a usage mistake (unknown option, missing argument).
 */
export class CliError extends Error {
  override readonly name = "CliError";
  constructor(
    message: string,
    readonly exitCode: 1 | 2 = 1,
  ) {
    super(message);
  }
}
