/**
 * `sectionsmith COMMAND …`: dispatches to the commands listed in COMMANDS. Adding a command is
 * one line here plus its file in cli/commands/. Flags are parsed strictly (an unknown flag is an
 * error, never ignored) from each command's own flag list, which also writes its help.
 */
import { readFileSync } from 'node:fs';
import { parseArgs } from 'node:util';
import { EXIT_BAD_INPUT, EXIT_BUG, EXIT_OK, type CliIo, type Command } from './command.ts';
import { checkCommand } from './commands/check.ts';
import { compareCommand } from './commands/compare.ts';
import { memberCommand } from './commands/member.ts';
import { partCommand } from './commands/part.ts';
import { propsCommand } from './commands/props.ts';

/** Every subcommand, in the order help lists them. */
export const COMMANDS: readonly Command[] = [
  propsCommand,
  partCommand,
  memberCommand,
  checkCommand,
  compareCommand,
];

const HELP_FLAG = { name: 'help', type: 'boolean', description: 'show this help' } as const;

function flagLine(flag: { name: string; type: string; value?: string; description: string }): string {
  const left = flag.type === 'string' ? `--${flag.name} ${flag.value ?? 'VALUE'}` : `--${flag.name}`;
  return `  ${left.padEnd(18)} ${flag.description}`;
}

export function commandHelp(command: Command): string {
  const flags = [...command.flags, HELP_FLAG].map(flagLine).join('\n');
  return `usage: sectionsmith ${command.usage}\n\n${command.description}\n\nflags:\n${flags}\n`;
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
    'exit codes: 0 success; 2 bad input or usage (the message names the file and the place); 1 internal error.',
    '',
    details,
  ].join('\n');
}

function version(): string {
  const pkg = JSON.parse(readFileSync(new URL('../package.json', import.meta.url), 'utf8')) as { version?: string };
  return pkg.version ?? 'unknown';
}

async function runCommand(command: Command, args: readonly string[], io: CliIo): Promise<number> {
  const options = Object.fromEntries([...command.flags, HELP_FLAG].map((f) => [f.name, { type: f.type }]));
  let parsed;
  try {
    parsed = parseArgs({ args: [...args], options, allowPositionals: true, strict: true });
  } catch (err) {
    io.err(`sectionsmith ${command.name}: ${err instanceof Error ? err.message : String(err)}\nrun "sectionsmith help ${command.name}" for the flags\n`);
    return EXIT_BAD_INPUT;
  }
  if (parsed.values.help === true) {
    io.out(commandHelp(command));
    return EXIT_OK;
  }
  return command.run(parsed.positionals, parsed.values, io);
}

/** Runs the command line; returns the exit code. Never throws. */
export async function runCli(argv: readonly string[], io: CliIo): Promise<number> {
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
  };
}
