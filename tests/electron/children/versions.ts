/** The numbered document texts the kill tests write and recognise (large, so a save takes time). */
export function versionText(version: number): string {
  const document = {
    format: 'sectionsmith-section',
    version: 1,
    name: `trailer frame rail, revision ${version}`,
    unit: 'in',
    parts: [],
    materials: [],
    defaultMaterial: null,
    // ~1 MB of padding so that a kill has a fair chance of landing inside the write.
    notes: `${version}:`.repeat(1 + Math.floor(1_000_000 / (String(version).length + 1))),
  };
  return JSON.stringify(document);
}

/** The version number whose text is exactly `text`, or null if `text` is no complete version. */
export function versionOf(text: string): number | null {
  const match = /"name":"trailer frame rail, revision (\d+)"/.exec(text);
  if (!match?.[1]) return null;
  const version = Number(match[1]);
  return versionText(version) === text ? version : null;
}
