/**
 * What a subcommand is: its name, help text, flags and a run function. cli/main.ts lists the
 * commands; each lives in its own file under cli/commands/. The command line is a thin consumer
 * of core: commands read files, call core, and print.
 */

/**
 * Exit codes, the same for every command: 0 success; 1 a result that needs attention (check:
 * some rows flagged); 2 bad input or bad usage; 3 an internal error (a bug), kept apart from 1 so
 * a crash never reads as "flagged".
 */
export const EXIT_OK = 0;
export const EXIT_FLAGGED = 1;
export const EXIT_BAD_INPUT = 2;
export const EXIT_BUG = 3;

/** The exit codes as help prints them. */
export const EXIT_CODES_HELP =
  'exit codes: 0 success; 1 a result that needs attention (check: some rows flagged); 2 bad input or usage (the message names the file and the place); 3 internal error (please report it).';

/** Where a command reads and writes; the process's own in cli/main.ts, a recorder in tests. */
export interface CliIo {
  readonly out: (text: string) => void;
  readonly err: (text: string) => void;
  /** Reads a text file (UTF-8); throws the platform's error when it cannot. */
  readonly readFile: (path: string) => string;
  /** A file's size in bytes, when the host can tell without reading it; throws like readFile. */
  readonly fileSize?: (path: string) => number;
}

export interface FlagSpec {
  /** Without the dashes: 'json' for --json. */
  readonly name: string;
  readonly type: 'boolean' | 'string';
  /** Placeholder shown in help for string flags, e.g. 'U'. */
  readonly value?: string;
  readonly description: string;
  /**
   * A string flag that may be given several times (`--map a=b --map c=d`). Its values arrive in
   * order in the run function's `lists` argument, never in `flags` (where only one would fit).
   */
  readonly multiple?: boolean;
}

export type FlagValues = Readonly<Record<string, string | boolean | undefined>>;

/** Every value of each repeatable flag, in the order given; [] when the flag is absent. */
export type FlagLists = Readonly<Record<string, readonly string[]>>;

export interface Command {
  readonly name: string;
  /** One line for the command list. */
  readonly summary: string;
  /** Synopsis, e.g. 'props FILE [--json] [--unit U]'. */
  readonly usage: string;
  /** Paragraphs shown by `sectionsmith help NAME`. */
  readonly description: string;
  readonly flags: readonly FlagSpec[];
  /** `lists` holds the repeatable flags' values (cli/main.ts always passes it; a direct call may leave it out). */
  readonly run: (positionals: readonly string[], flags: FlagValues, io: CliIo, lists?: FlagLists) => number | Promise<number>;
}

/** The caution printed with every result (results feed structural decisions). */
export const CAUTION =
  'Results are preliminary: verify them with a licensed engineer and the local building code, which govern.';
