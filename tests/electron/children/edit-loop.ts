/**
 * Child process for the kill-mid-edit test: simulates a user editing a document (one change every
 * 2 ms), handing each revision to the debounced recovery writer as the renderer does, and printing
 * "written N" each time the store has written revision N, until killed.
 */
import { createDebouncedWriter, createRecoveryStore } from '../../../electron/recovery.ts';
import { editedDocumentText } from './edits.ts';

const [folder, delay] = process.argv.slice(2);
if (!folder) throw new Error('usage: edit-loop.ts FOLDER DELAY_MS');

const store = createRecoveryStore(folder);
const reportingStore = {
  ...store,
  async write(text: string) {
    await store.write(text);
    const revision = /revision (\d+)/.exec(text)?.[1];
    process.stdout.write(`written ${revision}\n`);
  },
};
const writer = createDebouncedWriter(reportingStore, Number(delay ?? 20), (error) => {
  process.stderr.write(`recovery write failed: ${String(error)}\n`);
  process.exit(2);
});

let revision = 0;
setInterval(() => {
  revision += 1;
  writer.schedule(editedDocumentText(revision));
}, 2);
