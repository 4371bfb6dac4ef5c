/**
 * Child process for the kill tests: saves numbered versions of one document to `target` in a
 * loop with saveAtomically, printing "begin N" before and "saved N" after each save, until killed.
 * With mode "hang", the first write stops half way and never finishes (a deterministic mid-save kill).
 */
import { promises as fs } from 'node:fs';
import { saveAtomically, type SaveFs } from '../../../electron/save.ts';
import { versionText } from './versions.ts';

const [target, mode] = process.argv.slice(2);
if (!target) throw new Error('usage: save-loop.ts TARGET [hang]');

/** An fs whose writeFile writes the first half of the data and then waits forever. */
const hangingFs: SaveFs = {
  ...fs,
  open: (async (...args: Parameters<typeof fs.open>) => {
    const handle = await fs.open(...args);
    const writeFile = async (data: Buffer): Promise<void> => {
      await handle.write(data, 0, Math.floor(data.byteLength / 2));
      process.stdout.write('half-written\n');
      await new Promise(() => undefined);
    };
    return Object.assign(handle, { writeFile });
  }) as typeof fs.open,
};

for (let version = 1; ; version += 1) {
  process.stdout.write(`begin ${version}\n`);
  await saveAtomically(target, versionText(version), mode === 'hang' ? { fs: hangingFs } : {});
  process.stdout.write(`saved ${version}\n`);
}
