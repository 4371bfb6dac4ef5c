/**
 * The torsion the editor solves in the background (renderer/controller/torsion.worker.ts) for a
 * document whose joints may be "not connected": parts that do not act together twist on their
 * own (core/joints torsionByJointGroups: J summed over the groups, G-weighted with several
 * materials), and `components` counts the pieces, which the results panel reads as "no shared
 * shear centre or Cw" (Saint-Venant torsion of separate members; Timoshenko & Goodier). When
 * every joint is connected this is torsionConstants of the gross section, as before.
 * Lengths in the document unit. Throws what core/torsion throws (the worker reports it).
 */
import type { SectionDocument } from '../../../core/document/types.ts';
import { torsionByJointGroups } from '../../../core/joints/index.ts';
import { regionFromDocument } from '../../../core/section/index.ts';
import { torsionConstants, type TorsionOptions } from '../../../core/torsion/index.ts';
import type { TorsionResult } from '../../../core/torsion/types.ts';

export function torsionOfDocument(doc: SectionDocument, options: TorsionOptions = {}): TorsionResult {
  const separate = doc.joints?.some((j) => j.kind.type === 'not-connected') ? torsionByJointGroups(doc, options) : null;
  if (separate === null) return torsionConstants(regionFromDocument(doc).region, options);
  const results = separate.groups.map((g) => g.result);
  const first = results[0] as TorsionResult;
  const sum = (f: (r: TorsionResult) => number): number => results.reduce((s, r) => s + f(r), 0);
  return {
    ...first,
    J: separate.J,
    jRelativeError: separate.jRelativeError,
    components: sum((r) => r.components),
    meshElements: sum((r) => r.meshElements),
    meshNodes: sum((r) => r.meshNodes),
    iterations: sum((r) => r.iterations),
  };
}
