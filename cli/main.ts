/**
 * `sectionsmith COMMAND …`: dispatches to the commands listed in COMMANDS. Adding a command is
 * one line here plus its file in cli/commands/. Flags are parsed strictly (an unknown flag is an
 * error, never ignored) from each command's own flag list, which also writes its help.
 */
import { readFileSync, statSync } from 'node:fs';
import { parseArgs } from 'node:util';
import { EXIT_BAD_INPUT, EXIT_BUG, EXIT_CODES_HELP, EXIT_OK, type CliIo, type Command, type FlagLists, type FlagValues } from './command.ts';
import { checkCommand } from './commands/check.ts';
import { compareCommand } from './commands/compare.ts';
import { memberCommand } from './commands/member.ts';
import { partCommand } from './commands/part.ts';
import { propsCommand } from './commands/props.ts';
import { BadInputError, terminalText } from './output.ts';

/** Every subcommand, in the order help lists them. */
export const COMMANDS: readonly Command[] = [
  propsCommand,
  partCommand,
  memberCommand,
  checkCommand,
  compareCommand,
];

const HELP_FLAG = { name: 'help', type: 'boolean', description: 'show this help' } as const;

function flagLine(flag: { name: string; type: string; value?: string; description: string; multiple?: boolean }): string {
  const left = flag.type === 'string' ? `--${flag.name} ${flag.value ?? 'VALUE'}` : `--${flag.name}`;
  return `  ${left.padEnd(18)} ${flag.description}${flag.multiple === true ? ' (may be repeated)' : ''}`;
}

export function commandHelp(command: Command): string {
  const flags = [...command.flags, HELP_FLAG].map(flagLine).join('\n');
  return `usage: sectionsmith ${command.usage}\n\n${command.description}\n\nflags:\n${flags}\n\n${EXIT_CODES_HELP}\n`;
}

export function generalHelp(): string {
  const list = COMMANDS.map((c) => `  ${c.name.padEnd(10)} ${c.summary}`).join('\n');
  const details = COMMANDS.map((c) => commandHelp(c)).join('\n');
  return [
    'sectionsmith: properties of structural cross-sections from the command line.',
    '',
    'usage: sectionsmith COMMAND [ARGUMENTS] [FLAGS]',
    '       sectionsmith help [COMMAND]',
    '       sectionsmith --help | --version',
    '',
    'commands:',
    list,
    '',
    EXIT_CODES_HELP,
    '',
    details,
  ].join('\n');
}

function version(): string {
  const pkg = JSON.parse(readFileSync(new URL('../package.json', import.meta.url), 'utf8')) as { version?: string };
  return pkg.version ?? 'unknown';
}

/**
 * A command's arguments by its flag list (strict: an unknown flag or a missing value throws).
 * A flag marked `multiple` keeps every value, in order, in `lists`; any other flag given twice
 * is refused rather than silently keeping the last value.
 */
export function parseFlags(command: Command, args: readonly string[]): { positionals: string[]; flags: FlagValues; lists: FlagLists } {
  const specs = [...command.flags, HELP_FLAG];
  const options = Object.fromEntries(specs.map((f) => [f.name, { type: f.type, multiple: true }]));
  const parsed = parseArgs({ args: [...args], options, allowPositionals: true, strict: true });
  const flags: Record<string, string | boolean | undefined> = {};
  const lists: Record<string, readonly string[]> = {};
  for (const spec of specs) {
    const values = (parsed.values[spec.name] ?? []) as readonly (string | boolean)[];
    if ('multiple' in spec && spec.multiple === true) {
      lists[spec.name] = values.filter((v): v is string => typeof v === 'string');
      continue;
    }
    if (values.length > 1 && spec.type === 'string') throw new Error(`--${spec.name} was given ${values.length} times; give it once`);
    flags[spec.name] = values[values.length - 1];
  }
  return { positionals: parsed.positionals, flags, lists };
}

async function runCommand(command: Command, args: readonly string[], io: CliIo): Promise<number> {
  let parsed;
  try {
    parsed = parseFlags(command, args);
  } catch (err) {
    io.err(`sectionsmith ${command.name}: ${err instanceof Error ? err.message : String(err)}\nrun "sectionsmith help ${command.name}" for the flags\n`);
    return EXIT_BAD_INPUT;
  }
  if (parsed.flags.help === true) {
    io.out(commandHelp(command));
    return EXIT_OK;
  }
  try {
    return await command.run(parsed.positionals, parsed.flags, io, parsed.lists);
  } catch (err) {
    if (!(err instanceof BadInputError)) throw err;
    io.err(`sectionsmith ${command.name}: ${err.message}\n`);
    return EXIT_BAD_INPUT;
  }
}

/** Runs the command line; returns the exit code. Never throws. */
export async function runCli(argv: readonly string[], rawIo: CliIo): Promise<number> {
  // Names and labels come from user files: no control character reaches the terminal.
  const io: CliIo = { ...rawIo, out: (text) => rawIo.out(terminalText(text)), err: (text) => rawIo.err(terminalText(text)) };
  const [first, ...rest] = argv;
  try {
    if (first === undefined) {
      io.err(generalHelp());
      return EXIT_BAD_INPUT;
    }
    if (first === '--help' || first === '-h') {
      io.out(generalHelp());
      return EXIT_OK;
    }
    if (first === '--version') {
      io.out(`sectionsmith ${version()}\n`);
      return EXIT_OK;
    }
    if (first === 'help') {
      const target = rest[0];
      if (target === undefined) {
        io.out(generalHelp());
        return EXIT_OK;
      }
      const command = COMMANDS.find((c) => c.name === target);
      if (!command) {
        io.err(`sectionsmith help: no command "${target}"; commands: ${COMMANDS.map((c) => c.name).join(', ')}\n`);
        return EXIT_BAD_INPUT;
      }
      io.out(commandHelp(command));
      return EXIT_OK;
    }
    const command = COMMANDS.find((c) => c.name === first);
    if (!command) {
      io.err(`sectionsmith: no command "${first}"; commands: ${COMMANDS.map((c) => c.name).join(', ')} (see sectionsmith --help)\n`);
      return EXIT_BAD_INPUT;
    }
    return await runCommand(command, rest, io);
  } catch (err) {
    io.err(`sectionsmith: internal error (please report it): ${err instanceof Error ? (err.stack ?? err.message) : String(err)}\n`);
    return EXIT_BUG;
  }
}

/** The real process's input and output. */
export function processIo(): CliIo {
  return {
    out: (text) => void process.stdout.write(text),
    err: (text) => void process.stderr.write(text),
    readFile: (path) => readFileSync(path, 'utf8'),
    fileSize: (path) => statSync(path).size,
  };
}
