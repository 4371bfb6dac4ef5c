/**
 * The recent-files list of the desktop host: newest first, at most RECENT_LIMIT, no duplicates,
 * stored as JSON in the app's data folder. A file that is gone is dropped when the list is read.
 */
import { promises as fs } from 'node:fs';
import path from 'node:path';
import * as v from 'valibot';
import { saveAtomically } from './save.ts';

export const RECENT_LIMIT = 10;

const recentSchema = v.array(v.strictObject({ name: v.string(), handle: v.pipe(v.string(), v.check((p) => path.isAbsolute(p))) }));
export type RecentFile = v.InferOutput<typeof recentSchema>[number];

export function withRecent(list: readonly RecentFile[], filePath: string): RecentFile[] {
  const entry = { name: path.basename(filePath), handle: filePath };
  return [entry, ...list.filter((r) => r.handle !== filePath)].slice(0, RECENT_LIMIT);
}

export async function readRecentFiles(file: string): Promise<RecentFile[]> {
  let parsed: unknown;
  try {
    parsed = JSON.parse(await fs.readFile(file, 'utf8'));
  } catch {
    return []; // missing or unreadable list: start a new one rather than refuse to start
  }
  const result = v.safeParse(recentSchema, parsed);
  if (!result.success) return [];
  const present = await Promise.all(result.output.map((r) => fs.stat(r.handle).then((s) => s.isFile(), () => false)));
  return result.output.filter((_, i) => present[i]);
}

export async function writeRecentFiles(file: string, list: readonly RecentFile[]): Promise<void> {
  await fs.mkdir(path.dirname(file), { recursive: true });
  await saveAtomically(file, JSON.stringify(list, null, 2), { keepBackup: false });
}
