/** The document a simulated editing session produces at each revision: a plate that grows. */
export function editedDocumentText(revision: number): string {
  return JSON.stringify({
    format: 'sectionsmith-section',
    version: 1,
    name: `mezzanine flitch beam "revision ${revision}"`,
    unit: 'mm',
    parts: [
      {
        id: 'plate',
        name: 'steel flitch plate',
        type: 'rectangle',
        width: 10,
        height: 200 + revision,
        placement: { x: 0, y: 0, rotationDeg: 0, mirror: false },
        operation: 'add',
        material: null,
        visible: true,
      },
    ],
    materials: [],
    defaultMaterial: null,
  }, null, 2);
}
