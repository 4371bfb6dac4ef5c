/**
 * What a subcommand is: its name, help text, flags and a run function. cli/main.ts lists the
 * commands; each lives in its own file under cli/commands/. The command line is a thin consumer
 * of core: commands read files, call core, and print.
 */

/** Exit codes: 0 success; 1 an internal error (a bug); 2 bad input or bad usage. */
export const EXIT_OK = 0;
export const EXIT_BUG = 1;
export const EXIT_BAD_INPUT = 2;

/** Where a command reads and writes; the process's own in cli/main.ts, a recorder in tests. */
export interface CliIo {
  readonly out: (text: string) => void;
  readonly err: (text: string) => void;
  /** Reads a text file (UTF-8); throws the platform's error when it cannot. */
  readonly readFile: (path: string) => string;
}

export interface FlagSpec {
  /** Without the dashes: 'json' for --json. */
  readonly name: string;
  readonly type: 'boolean' | 'string';
  /** Placeholder shown in help for string flags, e.g. 'U'. */
  readonly value?: string;
  readonly description: string;
}

export type FlagValues = Readonly<Record<string, string | boolean | undefined>>;

export interface Command {
  readonly name: string;
  /** One line for the command list. */
  readonly summary: string;
  /** Synopsis, e.g. 'props FILE [--json] [--unit U]'. */
  readonly usage: string;
  /** Paragraphs shown by `sectionsmith help NAME`. */
  readonly description: string;
  readonly flags: readonly FlagSpec[];
  readonly run: (positionals: readonly string[], flags: FlagValues, io: CliIo) => number | Promise<number>;
}

/** The caution printed with every result (results feed structural decisions). */
export const CAUTION =
  'Results are preliminary: verify them with a licensed engineer and the local building code, which govern.';
