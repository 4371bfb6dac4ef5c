// Saving bytes (XLSX) from the desktop host: electron/export-bytes.ts with a fake dialog and a
// fake writer. The bytes written are the bytes given (identity); a cancelled dialog writes nothing.
import { describe, expect, it } from 'vitest';
import { exportBytes, XLSX_FILTER } from '../../electron/export-bytes.ts';

function fakes(answer: string | null) {
  const log: { asked: [string, unknown][]; saved: [string, Uint8Array][] } = { asked: [], saved: [] };
  return {
    log,
    deps: {
      chooseTarget: (name: string, filter: { name: string; extensions: string[] }) => {
        log.asked.push([name, filter]);
        return Promise.resolve(answer);
      },
      save: (filePath: string, bytes: Uint8Array) => {
        log.saved.push([filePath, bytes]);
        return Promise.resolve();
      },
    },
  };
}

describe('exportBytes (desktop XLSX export)', () => {
  it('asks with the suggested name and the XLSX filter, then writes exactly the bytes', async () => {
    const { log, deps } = fakes('/home/u/compare.xlsx');
    const bytes = Uint8Array.of(80, 75, 3, 4);
    expect(await exportBytes({ suggestedName: 'compare.xlsx', bytes }, deps)).toBe(true);
    expect(log.asked).toEqual([['compare.xlsx', XLSX_FILTER]]);
    expect(log.saved).toHaveLength(1);
    expect(log.saved[0]?.[0]).toBe('/home/u/compare.xlsx');
    expect([...(log.saved[0]?.[1] ?? [])]).toEqual([80, 75, 3, 4]);
  });

  it('adds .xlsx when the chosen name has no extension', async () => {
    const { log, deps } = fakes('/home/u/girder');
    await exportBytes({ suggestedName: 'girder.xlsx', bytes: new Uint8Array(1) }, deps);
    expect(log.saved[0]?.[0]).toBe('/home/u/girder.xlsx');
  });

  it('a cancelled dialog writes nothing and says so', async () => {
    const { log, deps } = fakes(null);
    expect(await exportBytes({ suggestedName: 'a.xlsx', bytes: new Uint8Array(1) }, deps)).toBe(false);
    expect(log.saved).toHaveLength(0);
  });

  it('a failed write is an error, not a silent false', async () => {
    const { deps } = fakes('/ro/a.xlsx');
    await expect(exportBytes({ suggestedName: 'a.xlsx', bytes: new Uint8Array(1) }, { ...deps, save: () => Promise.reject(new Error('read-only file system')) })).rejects.toThrow(/read-only/);
  });
});
