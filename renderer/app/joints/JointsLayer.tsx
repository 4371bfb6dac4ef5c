/**
 * The joints' canvas layer: each joint's contact segments drawn over the parts (line style by
 * kind, the joint chosen in the list in the accent colour), and, when switched on, the
 * shear-flow diagram along thin plate walls (joints-model.ts shearFlowDiagram): q drawn across
 * each wall, scaled so the largest |q| is DIAGRAM_PIXELS from the wall, with that value labelled.
 * Listens to nothing: joints are chosen in the list (JointsPanel).
 */
import { useMemo, useSyncExternalStore, type ReactElement } from 'react';
import { Group, Layer, Line, Text } from 'react-konva';
import type { JointKind, SectionDocument } from '../../../core/document/types.ts';
import { convertLength, formatSig } from '../../../core/units/index.ts';
import { fromSI } from '../../../core/units/quantity.ts';
import { toScreen, type View } from '../../controller/view.ts';
import { jointKey, jointsOverview, readShears, shearFlowDiagram, shearUnits } from './joints-model.ts';
import type { JointsStore } from './joints-store.ts';

/** Colours of this layer (its own, beside the canvas palette). */
export const JOINT_COLOURS = { joint: '#1d6b8f', chosen: '#c0612b', loose: '#8a8a8a', diagram: '#6a3d9a' } as const;
export const DIAGRAM_PIXELS = 36;

function dashOf(kind: JointKind): number[] | undefined {
  switch (kind.type) {
    case 'welded':
      return undefined;
    case 'fastened':
      return [2, 6];
    case 'glued':
      return [8, 4];
    case 'not-connected':
      return [3, 3];
  }
}

export function JointsLayer({ doc, view, store }: { readonly doc: SectionDocument; readonly view: View; readonly store: JointsStore }): ReactElement | null {
  const ui = useSyncExternalStore(store.subscribe, store.getState);
  const overview = jointsOverview(doc);
  const loads = ui.diagram ? readShears(ui) : null;
  const diagram = useMemo(() => (loads === null ? null : shearFlowDiagram(doc, loads)), [doc, loads?.Vy, loads?.Vx]);
  if (!overview.ready || overview.joints.length === 0) return null;
  const units = shearUnits(doc.unit);
  const qText = (q: number): string => formatSig(fromSI(q / convertLength(1, doc.unit, 'm'), 'lineLoad', units.q), 3);
  return (
    <Layer listening={false}>
      {diagram?.walls.map((w) => {
        // Runs of stations where q is defined; each drawn closed against the wall, so it reads as a filled diagram.
        const runs: number[][] = [];
        let run: number[] = [];
        let lastWall: number[] = [];
        let peak = { q: 0, x: 0, y: 0 };
        const end = (): void => {
          if (run.length > 0) runs.push([...run, ...lastWall]);
          run = [];
        };
        for (const st of w.stations) {
          if (Number.isNaN(st.q)) {
            end();
            continue;
          }
          const off = diagram.qMax > 0 ? (st.q / diagram.qMax) * DIAGRAM_PIXELS : 0;
          const [sx, sy] = toScreen(view, [st.x, st.y]);
          const px = sx + w.nx * off, py = sy - w.ny * off;
          if (run.length === 0) run.push(sx, sy);
          run.push(px, py);
          lastWall = [sx, sy];
          if (Math.abs(st.q) > Math.abs(peak.q)) peak = { q: st.q, x: px, y: py };
        }
        end();
        return (
          <Group key={w.partId}>
            {runs.map((r, i) => (
              <Line key={i} points={r} stroke={JOINT_COLOURS.diagram} strokeWidth={1.5} fill={`${JOINT_COLOURS.diagram}33`} closed />
            ))}
            {peak.q !== 0 && <Text x={peak.x + 4} y={peak.y - 6} text={`${qText(Math.abs(peak.q))} ${units.q}`} fontSize={10} fill={JOINT_COLOURS.diagram} />}
          </Group>
        );
      })}
      {overview.joints.map((j) => {
        const chosen = jointKey(j.partIds) === ui.selected;
        return j.segments.map((s, i) => {
          const [x0, y0] = toScreen(view, [s.x0, s.y0]);
          const [x1, y1] = toScreen(view, [s.x1, s.y1]);
          const loose = j.kind.type === 'not-connected';
          return (
            <Line
              key={`${jointKey(j.partIds)}-${i}`}
              points={[x0, y0, x1, y1]}
              stroke={chosen ? JOINT_COLOURS.chosen : loose ? JOINT_COLOURS.loose : JOINT_COLOURS.joint}
              strokeWidth={chosen ? 5 : 3}
              dash={dashOf(j.kind)}
              lineCap="round"
            />
          );
        });
      })}
    </Layer>
  );
}
