/**
 * Running the command line inside the test process, shared by the CLI tests: the whole of
 * `sectionsmith` through runCli with the real file system (`cli`), or one command with files held
 * in memory (`runCommand`). Output and errors are collected as text with the exit code.
 */
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runCli } from '../../cli/main.ts';
import type { CliIo, Command, FlagLists, FlagValues } from '../../cli/command.ts';

export interface CliRun {
  readonly code: number;
  readonly out: string;
  readonly err: string;
}

/** `sectionsmith ARGV…` through runCli, reading files from disk. */
export async function cli(...argv: string[]): Promise<CliRun> {
  let out = '';
  let err = '';
  const io = { out: (t: string) => void (out += t), err: (t: string) => void (err += t), readFile: (p: string) => readFileSync(p, 'utf8') };
  const code = await runCli(argv, io);
  return { code, out, err };
}

/** A fresh temporary folder, and a writer of named files in it (returns each file's path). */
export function tempFolder(prefix: string): { readonly dir: string; readonly file: (name: string, text: string) => string } {
  const dir = mkdtempSync(join(tmpdir(), prefix));
  return {
    dir,
    file: (name, text) => {
      const path = join(dir, name);
      writeFileSync(path, text);
      return path;
    },
  };
}

/** One command's run with `files` (name → text) as the only readable files; a missing one is ENOENT. */
export function runCommand(command: Command, files: Record<string, string>, positionals: string[], flags: FlagValues, lists: FlagLists = {}): CliRun {
  let out = '';
  let err = '';
  const io: CliIo = {
    out: (t) => {
      out += t;
    },
    err: (t) => {
      err += t;
    },
    readFile: (p) => {
      const text = Object.hasOwn(files, p) ? files[p] : undefined;
      if (text === undefined) throw Object.assign(new Error('missing'), { code: 'ENOENT' });
      return text;
    },
  };
  const code = command.run(positionals, flags, io, lists) as number;
  return { code, out, err };
}
