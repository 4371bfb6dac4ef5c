/**
 * The drawing. Konva handlers only translate pointer events into editor calls (STYLE.md §8);
 * layers are separate (§11): grid and rulers, document shapes, results overlay, interaction overlay.
 */
import { useEffect, useRef, useState, type ReactElement, type ReactNode } from 'react';
import { Stage, Layer, Line, Circle, Shape, Text, Group, Rect, Label, Tag } from 'react-konva';
import type Konva from 'konva';
import type { Editor, EditorState } from '../../editor/editor.ts';
import type { PartOutline, Vec } from '../../editor/geometry.ts';
import { asEditablePolygon, ringOf } from '../../editor/tools/vertex-edit.ts';
import { toWorld } from '../../editor/geometry.ts';
import type { Diagnostic } from '../../../core/geometry/types.ts';
import type { SectionProperties } from '../../../core/properties/types.ts';
import { COLOURS } from './palette.ts';
import { materialStyles, type Hatch, type MaterialStyle } from './material-style.ts';
import type { Overlays } from '../../controller/controller.ts';
import { placeLabels, scaleBar, type LabelBox, type LabelRequest } from './labels.ts';
import { gridIndices, gridStep, toScreen, toSection, zoomAt, type View } from '../../controller/view.ts';
import { formatSig, type LengthUnit } from '../../../core/units/index.ts';
import { formatDimension } from '../../../core/units/dimension.ts';
import { label } from './label-request.ts';
import { selectionDimensionOverlay } from './DimensionLines.tsx';
import { arcOfSegment, ringVertexCount } from '../../../core/geometry/ring.ts';
import type { Region } from '../../../core/geometry/types.ts';
import { stressAt } from '../../../core/stress/index.ts';
import { stressColour, toStressUnit, type StressView } from '../stress/stress.ts';

export type { Overlays } from '../../controller/controller.ts';

interface Props {
  readonly editor: Editor;
  readonly state: EditorState;
  readonly outlines: readonly PartOutline[];
  readonly properties: SectionProperties | null;
  /** Shear centre (section coordinates) from the finished torsion solve of this very document, if any. */
  readonly shearCentre?: readonly [number, number] | null;
  readonly diagnostics: readonly Diagnostic[];
  /** Stresses of the current document under the stress panel's forces, when computed. */
  readonly stress?: StressView | null;
  readonly overlays: Overlays;
  /** Layers of other features (each a react-konva Layer in a file of its own), drawn under the interaction layer. */
  readonly layers?: ReactNode;
  readonly view: View;
  readonly onView: (v: View) => void;
  readonly onSize: (w: number, h: number) => void;
  readonly onCursor: (p: Vec | null) => void;
}

const RULER = 22;
/** Ruler numbers without float noise or trailing zeros: 0.30000000000000004 → 0.3. */
const tick = (v: number): string => String(Number(v.toPrecision(10)));
const PICK_PIXELS = 7;

function flat(v: View, pts: readonly Vec[]): number[] {
  const out: number[] = [];
  for (const p of pts) {
    const s = toScreen(v, p);
    out.push(s[0], s[1]);
  }
  return out;
}

function GridAndRulers({ view, width, height, unit }: { view: View; width: number; height: number; unit: string }): ReactElement {
  const step = gridStep(view.scale);
  const major = step * 5;
  return (
    <Shape
      listening={false}
      sceneFunc={(ctx) => {
        const [x0, y1] = toSection(view, [0, 0]);
        const [x1, y0] = toSection(view, [width, height]);
        const line = (ax: number, ay: number, bx: number, by: number, colour: string): void => {
          ctx.beginPath();
          ctx.moveTo(ax, ay);
          ctx.lineTo(bx, by);
          ctx.strokeStyle = colour;
          ctx.lineWidth = 1;
          ctx.stroke();
        };
        for (const k of gridIndices(x0, x1, step)) {
          const sx = Math.round(view.ox + k * step * view.scale) + 0.5;
          line(sx, 0, sx, height, k === 0 ? COLOURS.axis : k % 5 === 0 ? COLOURS.gridMajor : COLOURS.gridMinor);
        }
        for (const k of gridIndices(y0, y1, step)) {
          const sy = Math.round(view.oy - k * step * view.scale) + 0.5;
          line(0, sy, width, sy, k === 0 ? COLOURS.axis : k % 5 === 0 ? COLOURS.gridMajor : COLOURS.gridMinor);
        }
        // Rulers along the top and left, labelled at major lines in the document unit.
        ctx.fillStyle = COLOURS.rulerBack;
        ctx.fillRect(0, 0, width, RULER);
        ctx.fillRect(0, 0, RULER, height);
        ctx.fillStyle = COLOURS.rulerText;
        ctx.font = '10px system-ui, sans-serif';
        for (const k of gridIndices(x0, x1, major)) {
          const sx = view.ox + k * major * view.scale;
          if (sx < RULER + 4) continue;
          line(sx, RULER - 6, sx, RULER, COLOURS.rulerText);
          ctx.fillText(tick(k * major), sx + 2, 12);
        }
        for (const k of gridIndices(y0, y1, major)) {
          const sy = view.oy - k * major * view.scale;
          if (sy < RULER + 4) continue;
          line(RULER - 6, sy, RULER, sy, COLOURS.rulerText);
          ctx.save();
          ctx.translate(12, sy - 2);
          ctx.rotate(-Math.PI / 2);
          ctx.fillText(tick(k * major), 0, 0);
          ctx.restore();
        }
        ctx.fillStyle = COLOURS.rulerBack;
        ctx.fillRect(0, 0, RULER, RULER);
        ctx.fillStyle = COLOURS.rulerText;
        ctx.fillText(unit, 3, 14);
      }}
    />
  );
}

function PartShape({ o, view, subtract, selected, style }: { o: PartOutline; view: View; subtract: boolean; selected: boolean; style?: MaterialStyle | undefined }): ReactElement {
  const fill = subtract ? COLOURS.holeFill : style ? style.fill : selected ? COLOURS.partFillSelected : COLOURS.partFill;
  const hatch = subtract ? 'none' : (style?.hatch ?? 'none');
  const stroke = selected ? COLOURS.selection : subtract ? COLOURS.holeStroke : COLOURS.partStroke;
  const dash = subtract ? [6, 4] : undefined;
  const width = selected ? 2 : 1.2;
  if (o.circle) {
    const c = toScreen(view, [o.circle.cx, o.circle.cy]);
    return <Circle x={c[0]} y={c[1]} radius={o.circle.r * view.scale} fill={fill} stroke={stroke} strokeWidth={width} dash={dash} listening={false} />;
  }
  return (
    <Shape
      listening={false}
      fill={fill}
      stroke={stroke}
      strokeWidth={width}
      dash={dash}
      fillRule="evenodd"
      sceneFunc={(ctx, shape) => {
        ctx.beginPath();
        for (const r of o.rings) {
          r.points.forEach((p, i) => {
            const s = toScreen(view, p);
            if (i === 0) ctx.moveTo(s[0], s[1]);
            else ctx.lineTo(s[0], s[1]);
          });
          ctx.closePath();
        }
        ctx.fillStrokeShape(shape);
        if (hatch !== 'none') drawHatch(ctx._context, o, view, hatch);
      }}
    />
  );
}

/** Hatch lines every 8 px inside the part's outline (even–odd), for a material whose fill repeats another's. */
function drawHatch(c: CanvasRenderingContext2D, o: PartOutline, view: View, hatch: Hatch): void {
  c.save();
  c.beginPath();
  for (const r of o.rings) {
    r.points.forEach((p, i) => {
      const s = toScreen(view, p);
      if (i === 0) c.moveTo(s[0], s[1]);
      else c.lineTo(s[0], s[1]);
    });
    c.closePath();
  }
  c.clip('evenodd');
  let x0 = Infinity, y0 = Infinity, x1 = -Infinity, y1 = -Infinity;
  for (const r of o.rings) for (const p of r.points) {
    const s = toScreen(view, p);
    x0 = Math.min(x0, s[0]); y0 = Math.min(y0, s[1]); x1 = Math.max(x1, s[0]); y1 = Math.max(y1, s[1]);
  }
  c.strokeStyle = COLOURS.partStroke;
  c.globalAlpha = 0.55;
  c.lineWidth = 0.8;
  c.beginPath();
  const span = x1 - x0 + y1 - y0;
  if (hatch === 'horizontal') for (let y = y0; y <= y1; y += 8) { c.moveTo(x0, y); c.lineTo(x1, y); }
  else for (let k = 0; k <= span; k += 8) {
    c.moveTo(x0 + k, y0); c.lineTo(x0 + k - (y1 - y0), y1);
    if (hatch === 'cross') { c.moveTo(x0 + k - (y1 - y0), y0); c.lineTo(x0 + k, y1); }
  }
  c.stroke();
  c.restore();
}

/** The legend of materials on the drawing: a swatch (fill and hatch) and the name of each material in use. */
function MaterialLegend({ entries, width }: { entries: readonly { id: string; name: string; style: MaterialStyle }[]; width: number }): ReactElement | null {
  if (entries.length < 2) return null;
  const w = 170, x = width - w - 10, y = RULER + 8;
  return (
    <Group x={x} y={y} listening={false}>
      <Rect width={w} height={entries.length * 16 + 8} fill={COLOURS.paper} opacity={0.9} cornerRadius={3} stroke={COLOURS.gridMajor} />
      {entries.map((e, i) => (
        <Group key={e.id} y={4 + i * 16}>
          <Shape
            sceneFunc={(ctx, shape) => {
              ctx.beginPath();
              ctx.rect(6, 1, 18, 11);
              ctx.fillStrokeShape(shape);
            }}
            fill={e.style.fill}
            stroke={COLOURS.partStroke}
            strokeWidth={0.8}
          />
          {e.style.hatch !== 'none' && <Line points={[8, 11, 15, 2, 14, 11, 21, 2]} stroke={COLOURS.partStroke} strokeWidth={0.8} opacity={0.7} />}
          <Text x={30} y={1} width={w - 34} text={`${e.name}${e.style.hatch !== 'none' ? ` (${e.style.hatch} hatch)` : ''}`} fontSize={11} fill={COLOURS.dimension} ellipsis wrap="none" />
        </Group>
      ))}
    </Group>
  );
}

/** What an overlay draws: shapes, labels to be placed (labels.ts), and boxes labels must keep clear of. */
interface OverlayParts {
  readonly items: ReactElement[];
  readonly labels: LabelRequest[];
  readonly reserved: LabelBox[];
}

function resultsOverlay({ p, view, overlays, width, height, shearCentre, unit }: { p: SectionProperties; view: View; overlays: Overlays; width: number; height: number; shearCentre: readonly [number, number] | null; unit: LengthUnit }): OverlayParts {
  const c = toScreen(view, [p.cx, p.cy]);
  const far = Math.hypot(width, height);
  const items: ReactElement[] = [];
  const labels: LabelRequest[] = [];
  const reserved: LabelBox[] = [];
  if (overlays.axes) {
    items.push(<Line key="ax" points={[c[0] - far, c[1], c[0] + far, c[1]]} stroke={COLOURS.centroid} strokeWidth={1} dash={[10, 4, 2, 4]} />);
    items.push(<Line key="ay" points={[c[0], c[1] - far, c[0], c[1] + far]} stroke={COLOURS.centroid} strokeWidth={1} dash={[10, 4, 2, 4]} />);
    labels.push(label('axis-x', 'x', [Math.min(width - 20, c[0] + 60), c[1]], [[0, 3], [0, -17]], 5, 12, COLOURS.centroid, 'italic'));
  }
  if (overlays.principal && !p.isotropic) {
    // Screen y is down: a CCW section angle θ draws as −θ on screen.
    const a = (-p.thetaDeg * Math.PI) / 180;
    const d1: Vec = [Math.cos(a), Math.sin(a)];
    const len = Math.min(width, height) * 0.45;
    items.push(<Line key="p1" points={[c[0] - d1[0] * len, c[1] - d1[1] * len, c[0] + d1[0] * len, c[1] + d1[1] * len]} stroke={COLOURS.principal} strokeWidth={1.4} />);
    items.push(<Line key="p2" points={[c[0] + d1[1] * len * 0.6, c[1] - d1[0] * len * 0.6, c[0] - d1[1] * len * 0.6, c[1] + d1[0] * len * 0.6]} stroke={COLOURS.principal} strokeWidth={1} dash={[6, 4]} />);
    labels.push(label('principal', `axis 1, θ = ${formatSig(Math.abs(p.thetaDeg) < 1e-9 ? 0 : p.thetaDeg, 4)}°`, [c[0] + d1[0] * len, c[1] + d1[1] * len], [[-120, -18], [4, -18], [-120, 4]], 2, 12, COLOURS.principal));
  }
  if (overlays.pna) {
    const y = toScreen(view, [0, p.pnaY])[1];
    const x = toScreen(view, [p.pnaX, 0])[0];
    items.push(<Line key="pnax" points={[0, y, width, y]} stroke={COLOURS.pna} strokeWidth={1} dash={[3, 3]} />);
    items.push(<Line key="pnay" points={[x, 0, x, height]} stroke={COLOURS.pna} strokeWidth={1} dash={[3, 3]} />);
    labels.push(label('pna-x', 'plastic neutral axis (x)', [RULER + 8, y], [[0, 3], [0, -17]], 3, 11, COLOURS.pna));
    labels.push(label('pna-y', 'plastic neutral axis (y)', [x, RULER + 8], [[4, 0], [-150, 0]], 4, 11, COLOURS.pna));
  }
  if (overlays.fibres) {
    const top = toScreen(view, [p.cx, p.yMax]);
    const bottom = toScreen(view, [p.cx, p.yMin]);
    const xo = c[0] + 14;
    items.push(<Line key="ft" points={[xo, top[1], xo, c[1]]} stroke={COLOURS.dimension} strokeWidth={1} pointerLength={5} />);
    items.push(<Line key="fb" points={[xo + 8, c[1], xo + 8, bottom[1]]} stroke={COLOURS.dimension} strokeWidth={1} />);
    labels.push(label('fibre-top', `c top ${formatDimension(p.yMax - p.cy, unit)}`, [xo, (top[1] + c[1]) / 2], [[4, -7]], 6, 11, COLOURS.dimension));
    labels.push(label('fibre-bottom', `c bottom ${formatDimension(p.cy - p.yMin, unit)}`, [xo + 8, (bottom[1] + c[1]) / 2], [[4, -7]], 6, 11, COLOURS.dimension));
  }
  if (overlays.dimensions) {
    const a = toScreen(view, [p.xMin, p.yMin]);
    const b = toScreen(view, [p.xMax, p.yMax]);
    const yb = a[1] + 26;
    const xl = a[0] - 26;
    items.push(<Line key="dw" points={[a[0], yb, b[0], yb]} stroke={COLOURS.dimension} strokeWidth={1} />);
    items.push(<Line key="dwa" points={[a[0], a[1] + 4, a[0], yb + 4]} stroke={COLOURS.dimension} strokeWidth={0.8} />);
    items.push(<Line key="dwb" points={[b[0], a[1] + 4, b[0], yb + 4]} stroke={COLOURS.dimension} strokeWidth={0.8} />);
    const wLabel = label('width', formatDimension(p.xMax - p.xMin, unit), [(a[0] + b[0]) / 2, yb], [], 1, 11, COLOURS.dimension);
    labels.push({ ...wLabel, offsets: [[-wLabel.width / 2, 3]] });
    items.push(<Line key="dh" points={[xl, a[1], xl, b[1]]} stroke={COLOURS.dimension} strokeWidth={1} />);
    items.push(<Line key="dha" points={[a[0] - 4, a[1], xl - 4, a[1]]} stroke={COLOURS.dimension} strokeWidth={0.8} />);
    items.push(<Line key="dhb" points={[a[0] - 4, b[1], xl - 4, b[1]]} stroke={COLOURS.dimension} strokeWidth={0.8} />);
    const hLabel = label('height', formatDimension(p.yMax - p.yMin, unit), [xl, (a[1] + b[1]) / 2], [], 1, 11, COLOURS.dimension);
    labels.push({ ...hLabel, offsets: [[-hLabel.width - 3, -hLabel.height / 2]] });
  }
  if (overlays.centroid) {
    items.push(
      <Group key="c" x={c[0]} y={c[1]}>
        <Circle radius={7} stroke={COLOURS.centroid} strokeWidth={1.5} />
        <Line points={[-11, 0, 11, 0]} stroke={COLOURS.centroid} strokeWidth={1.5} />
        <Line points={[0, -11, 0, 11]} stroke={COLOURS.centroid} strokeWidth={1.5} />
      </Group>,
    );
    reserved.push({ x: c[0] - 12, y: c[1] - 12, width: 24, height: 24 });
    labels.push(label('centroid', 'centroid', c, [[12, -20], [12, 6], [-70, -20]], 0, 11, COLOURS.centroid));
  }
  if (overlays.centroid && shearCentre) {
    // Shear centre (Trefftz, finite elements): a small diamond, labelled, distinct from the centroid's circle.
    const s = toScreen(view, shearCentre);
    items.push(
      <Group key="sc" x={s[0]} y={s[1]}>
        <Line points={[0, -8, 8, 0, 0, 8, -8, 0]} closed stroke={COLOURS.centroid} strokeWidth={1.5} />
      </Group>,
    );
    reserved.push({ x: s[0] - 9, y: s[1] - 9, width: 18, height: 18 });
    labels.push(label('shear-centre', 'shear centre', s, [[10, -18], [10, 4], [-85, -18], [-85, 4]], 1, 11, COLOURS.centroid));
  }
  return { items, labels, reserved };
}

/** Traces a region (arcs exact) on a canvas context in screen coordinates; holes by the even–odd rule. */
function traceRegion(ctx: { moveTo: (x: number, y: number) => void; lineTo: (x: number, y: number) => void; arc: (x: number, y: number, r: number, a0: number, a1: number, ccw: boolean) => void; closePath: () => void }, view: View, region: Region): void {
  for (const polygon of region) {
    for (const ring of [polygon.outer, ...polygon.holes]) {
      const n = ringVertexCount(ring);
      for (let i = 0; i < n; i++) {
        const s = toScreen(view, [ring.xy[2 * i] ?? 0, ring.xy[2 * i + 1] ?? 0]);
        if (i === 0) ctx.moveTo(s[0], s[1]);
        const arc = arcOfSegment(ring, i);
        if (arc) {
          // Screen y is down: section angle t draws at −t, and a CCW sweep runs anticlockwise on screen.
          const c = toScreen(view, [arc.cx, arc.cy]);
          ctx.arc(c[0], c[1], arc.r * view.scale, -arc.t0, -(arc.t0 + arc.sweep), arc.sweep > 0);
        } else {
          const j = i + 1 === n ? 0 : i + 1;
          const e = toScreen(view, [ring.xy[2 * j] ?? 0, ring.xy[2 * j + 1] ?? 0]);
          ctx.lineTo(e[0], e[1]);
        }
      }
      ctx.closePath();
    }
  }
}

/** The stress map (an exact linear gradient per piece), the extremes, the neutral axis, and the kern. */
function stressOverlay({ sv, view, overlays, width, height }: { sv: StressView; view: View; overlays: Overlays; width: number; height: number }): OverlayParts {
  const items: ReactElement[] = [];
  const labels: LabelRequest[] = [];
  const reserved: LabelBox[] = [];
  if (overlays.stress) {
    const { plane } = sv;
    const g = Math.hypot(plane.kx, plane.ky);
    const dir: Vec = g > 0 ? [plane.kx / g, plane.ky / g] : [1, 0];
    sv.pieces.forEach((piece, k) => {
      items.push(
        <Shape
          key={`sm${k}`}
          listening={false}
          sceneFunc={(ctx) => {
            const c = ctx._context;
            // The field is linear: a gradient along its direction, with stops at the colour-scale knots, is exact.
            const d0 = plane.cx * dir[0] + plane.cy * dir[1];
            const along = (a: number): Vec => [plane.cx + dir[0] * (a - d0), plane.cy + dir[1] * (a - d0)];
            const ex: number[] = [];
            for (const p of piece.region) for (let i = 0; i < ringVertexCount(p.outer); i++) ex.push((p.outer.xy[2 * i] ?? 0) * dir[0] + (p.outer.xy[2 * i + 1] ?? 0) * dir[1]);
            // Padded, since arcs may bulge past the vertices; the stops sample the exact field.
            const lo = Math.min(...ex), hi = Math.max(...ex);
            const pad = 0.5 * (hi - lo) + 1e-9;
            const a0 = lo - pad, a1 = hi + pad;
            const p0 = toScreen(view, along(a0));
            const p1 = toScreen(view, along(a1));
            const grad = c.createLinearGradient(p0[0], p0[1], p1[0], p1[1]);
            const steps = 32;
            for (let i = 0; i <= steps; i++) {
              const [x, y] = along(a0 + ((a1 - a0) * i) / steps);
              grad.addColorStop(i / steps, stressColour(stressAt(plane, piece.E, x, y), sv.scale));
            }
            c.beginPath();
            traceRegion(c, view, piece.region);
            c.fillStyle = grad;
            c.fill('evenodd');
            c.strokeStyle = COLOURS.partStroke;
            c.lineWidth = 1;
            c.stroke();
          }}
        />,
      );
    });
    if (sv.axis.segment) {
      const [a, b] = sv.axis.segment.map((q) => toScreen(view, q)) as [Vec, Vec];
      items.push(<Line key="na" points={[a[0], a[1], b[0], b[1]]} stroke={COLOURS.neutralAxis} strokeWidth={1.6} dash={[12, 5]} />);
      // Labelled on the visible part of the line, toward its right end.
      const [l, r] = a[0] <= b[0] ? [a, b] : [b, a];
      const t = (Math.min(r[0], width - 110) - l[0]) / (r[0] - l[0] || 1);
      const lx = l[0] + Math.max(0, Math.min(1, t)) * (r[0] - l[0]);
      const ly = l[1] + Math.max(0, Math.min(1, t)) * (r[1] - l[1]);
      labels.push(label('neutral-axis', 'neutral axis', [lx, ly], [[6, -22], [6, 6]], 3, 11, COLOURS.neutralAxis));
    }
    for (const [key, p, name] of [['max', sv.maxAt, 'σmax'], ['min', sv.minAt, 'σmin']] as const) {
      const s = toScreen(view, p);
      items.push(
        <Group key={`x${key}`} x={s[0]} y={s[1]}>
          <Circle radius={6} stroke={COLOURS.stressMark} strokeWidth={2} fill={COLOURS.handle} />
          <Circle radius={2} fill={COLOURS.stressMark} />
        </Group>,
      );
      reserved.push({ x: s[0] - 7, y: s[1] - 7, width: 14, height: 14 });
      labels.push(label(`stress-${key}`, `${name} ${sv.labels[key]}`, s, key === 'max' ? [[9, -20], [-150, -20]] : [[9, 6], [-150, 6]], 1, 12, COLOURS.stressMark, 'bold'));
    }
  }
  if (overlays.stress) {
    // Legend: the symmetric scale ±|σ|max, compression left, in the panel's stress unit.
    const w = 180, x0 = RULER + 14, y0 = height - 52;
    const half = formatSig(toStressUnit(sv.scale, sv.unit), 3);
    const stops: (string | number)[] = [];
    for (let i = 0; i <= 8; i++) stops.push(i / 8, stressColour(((i - 4) / 4) * sv.scale, sv.scale));
    items.push(
      <Group key="legend" x={x0} y={y0}>
        <Rect x={-6} y={-18} width={w + 12} height={50} fill={COLOURS.paper} opacity={0.9} cornerRadius={3} stroke={COLOURS.gridMajor} />
        <Text x={0} y={-14} text={`normal stress σ (${sv.unit})`} fontSize={11} fill={COLOURS.dimension} />
        <Rect x={0} y={0} width={w} height={10} fillLinearGradientStartPoint={{ x: 0, y: 0 }} fillLinearGradientEndPoint={{ x: w, y: 0 }} fillLinearGradientColorStops={stops} stroke={COLOURS.dimension} strokeWidth={0.5} />
        <Text x={0} y={14} text={`−${half}`} fontSize={10} fill={COLOURS.dimension} />
        <Text x={w / 2 - 3} y={14} text="0" fontSize={10} fill={COLOURS.dimension} />
        <Text x={w - 60} y={14} width={60} align="right" text={`+${half}`} fontSize={10} fill={COLOURS.dimension} />
      </Group>,
    );
    reserved.push({ x: x0 - 6, y: y0 - 18, width: w + 12, height: 50 });
  }
  if (overlays.kern && sv.kern.length >= 3) {
    items.push(<Line key="kern" points={flat(view, sv.kern)} closed stroke={COLOURS.kern} strokeWidth={1.8} fill="rgba(44,138,122,0.12)" />);
    const top = sv.kern.reduce((a, b) => (b[1] > a[1] ? b : a));
    const s = toScreen(view, top);
    labels.push(label('kern', 'kern', s, [[6, -16], [6, 4]], 4, 11, COLOURS.kern, 'italic'));
  }
  return { items, labels, reserved };
}

function InteractionOverlay({ state, outlines, view }: { state: EditorState; outlines: readonly PartOutline[]; view: View }): ReactElement {
  const items: ReactElement[] = [];
  const unit = state.doc.unit;
  const tool = state.tool;
  if (state.toolId === 'vertex') {
    for (const part of state.doc.parts) {
      if (!state.selection.includes(part.id)) continue;
      const poly = asEditablePolygon(part);
      if (!poly) continue;
      for (const ring of [-1, ...poly.holes.map((_, i) => i)]) {
        ringOf(poly, ring).forEach((q, index) => {
          const s = toScreen(view, toWorld(poly.placement, q));
          const chosen = tool.chosenVertex && tool.chosenVertex.partId === part.id && tool.chosenVertex.ring === ring && tool.chosenVertex.index === index;
          items.push(<Rect key={`h${part.id}-${ring}-${index}`} x={s[0] - 4} y={s[1] - 4} width={8} height={8} fill={chosen ? COLOURS.selection : COLOURS.handle} stroke={COLOURS.selection} strokeWidth={1.2} />);
        });
      }
    }
  } else {
    for (const o of outlines) {
      if (!state.selection.includes(o.partId) || o.circle) continue;
      // Standard parts: their outline points are chords of arcs, not corners worth marking.
      if (state.doc.parts.find((p) => p.id === o.partId)?.type === 'shape') continue;
      // One shape draws every marker: a node per vertex made selecting a 300,000-vertex outline
      // take minutes (React places each new node among its siblings, which grows with their count).
      const corners = o.vertices.map((v) => toScreen(view, v));
      items.push(
        <Shape
          key={`s${o.partId}`}
          listening={false}
          fill={COLOURS.selection}
          sceneFunc={(ctx, shape) => {
            ctx.beginPath();
            for (const s of corners) ctx.rect(s[0] - 2.5, s[1] - 2.5, 5, 5);
            ctx.fillShape(shape);
          }}
        />,
      );
    }
  }
  const d = tool.draft;
  if (d?.kind === 'rectangle') {
    const a = toScreen(view, d.a);
    const b = toScreen(view, d.b);
    items.push(<Rect key="dr" x={Math.min(a[0], b[0])} y={Math.min(a[1], b[1])} width={Math.abs(b[0] - a[0])} height={Math.abs(b[1] - a[1])} stroke={COLOURS.draft} dash={[5, 3]} strokeWidth={1.5} />);
    items.push(<Text key="drt" x={Math.max(a[0], b[0]) + 6} y={Math.max(a[1], b[1]) + 4} text={`${formatDimension(Math.abs(d.b[0] - d.a[0]), unit)} × ${formatDimension(Math.abs(d.b[1] - d.a[1]), unit)}`} fontSize={12} fill={COLOURS.draft} />);
  } else if (d?.kind === 'circle') {
    const c = toScreen(view, d.centre);
    items.push(<Circle key="dc" x={c[0]} y={c[1]} radius={d.radius * view.scale} stroke={COLOURS.draft} dash={[5, 3]} strokeWidth={1.5} />);
    items.push(<Text key="dct" x={c[0] + d.radius * view.scale + 6} y={c[1]} text={`⌀ ${formatDimension(2 * d.radius, unit)}`} fontSize={12} fill={COLOURS.draft} />);
  } else if (d?.kind === 'polygon' && d.points.length > 0) {
    const pts = d.cursor ? [...d.points, d.cursor] : d.points;
    items.push(<Line key="dp" points={flat(view, pts)} stroke={COLOURS.draft} strokeWidth={1.5} dash={[5, 3]} />);
    d.points.forEach((p, i) => {
      const s = toScreen(view, p);
      items.push(<Circle key={`dpv${i}`} x={s[0]} y={s[1]} radius={i === 0 ? 6 : 3.5} stroke={COLOURS.draft} fill={i === 0 && d.closing ? COLOURS.draft : COLOURS.handle} />);
    });
  }
  for (const [i, g] of (tool.guides ?? []).entries()) {
    if (g.kind === 'point') {
      const s = toScreen(view, g.at);
      items.push(<Circle key={`g${i}`} x={s[0]} y={s[1]} radius={6} stroke={COLOURS.guide} strokeWidth={2} />);
      items.push(<Text key={`gt${i}`} x={s[0] + 8} y={s[1] - 18} text={g.target} fontSize={11} fill={COLOURS.guide} />);
    } else if (g.kind === 'vertical') {
      const x = toScreen(view, [g.x, 0])[0];
      items.push(<Line key={`g${i}`} points={[x, 0, x, 5000]} stroke={COLOURS.guide} strokeWidth={1} dash={[4, 4]} />);
    } else {
      const y = toScreen(view, [0, g.y])[1];
      items.push(<Line key={`g${i}`} points={[0, y, 8000, y]} stroke={COLOURS.guide} strokeWidth={1} dash={[4, 4]} />);
    }
  }
  return <>{items}</>;
}

function DiagnosticMarks({ diagnostics, view }: { diagnostics: readonly Diagnostic[]; view: View }): ReactElement {
  return (
    <>
      {diagnostics.map((d, i) => {
        if (!d.at) return null;
        const s = toScreen(view, d.at);
        return (
          <Group key={i} x={s[0]} y={s[1]}>
            <Circle radius={10} stroke={COLOURS.diagnostic} strokeWidth={2.5} />
            <Text x={12} y={-20} text={`${i + 1}`} fontSize={13} fontStyle="bold" fill={COLOURS.diagnostic} />
          </Group>
        );
      })}
    </>
  );
}

export function Canvas(props: Props): ReactElement {
  const { editor, state, outlines, view, onView, overlays } = props;
  const host = useRef<HTMLDivElement>(null);
  const [size, setSize] = useState({ width: 800, height: 600 });
  const pan = useRef<{ start: Vec; view: View } | null>(null);
  const dragging = useRef(false);
  const viewRef = useRef(view);
  viewRef.current = view;
  const { onSize } = props;

  useEffect(() => {
    const el = host.current;
    if (!el) return undefined;
    const ro = new ResizeObserver(() => {
      const w = el.clientWidth;
      const h = el.clientHeight;
      setSize({ width: w, height: h });
      onSize(w, h);
    });
    ro.observe(el);
    return () => ro.disconnect();
  }, [onSize]);

  useEffect(() => {
    editor.setPickRadius(PICK_PIXELS / view.scale);
    editor.setSnapSettings({ grid: gridStep(view.scale) });
  }, [editor, view.scale]);

  const pointer = (e: Konva.KonvaEventObject<MouseEvent>): { screen: Vec; p: Vec } | null => {
    const pos = e.target.getStage()?.getPointerPosition();
    if (!pos) return null;
    return { screen: [pos.x, pos.y], p: toSection(view, [pos.x, pos.y]) };
  };

  const input = (e: MouseEvent, p: Vec) => ({ p, alt: e.altKey, shift: e.shiftKey });

  const selected = new Set(state.selection);
  const order = state.doc.parts.map((part, i) => ({ part, o: outlines[i] })).filter((x) => x.part.visible && x.o);
  const adds = order.filter((x) => x.part.operation === 'add');
  const subs = order.filter((x) => x.part.operation === 'subtract');
  // Fills by material (each its own; a hatch where a fill repeats), and the legend of those in use.
  const materialOf = (m: string | null): string => m ?? state.doc.defaultMaterial ?? '';
  const styles = materialStyles([...new Set(['', ...state.doc.materials.map((m) => m.id)])]);
  const inUse = [...new Set(adds.map((x) => materialOf(x.part.material)))];
  const legend = inUse.map((id) => ({ id: id || 'none', name: state.doc.materials.find((m) => m.id === id)?.name ?? 'no material', style: styles.get(id) ?? { fill: COLOURS.partFill, hatch: 'none' as const } }));

  // Overlays, then their labels placed together so none covers another or the stress legend.
  const stressParts = props.stress && (overlays.stress || overlays.kern) ? stressOverlay({ sv: props.stress, view, overlays, width: size.width, height: size.height }) : null;
  const resultParts = props.properties ? resultsOverlay({ p: props.properties, view, overlays, width: size.width, height: size.height, shearCentre: props.shearCentre ?? null, unit: state.doc.unit }) : null;
  const dimParts = overlays.dimensions ? selectionDimensionOverlay(state.doc.parts, outlines, state.selection, state.doc.unit, view) : { items: [], labels: [] };
  const requests = [...(resultParts?.labels ?? []), ...dimParts.labels, ...(stressParts?.labels ?? [])];
  const bar = scaleBar(view.scale, size.width, size.height);
  const { placed } = placeLabels(requests, [...(resultParts?.reserved ?? []), ...(stressParts?.reserved ?? []), bar.box, ...(legend.length > 1 ? [{ x: size.width - 180, y: RULER + 8, width: 170, height: legend.length * 16 + 8 }] : [])], size.width, size.height);
  const labelStyle = new Map(requests.map((r) => [r.id, r as LabelRequest & { fontSize?: number; colour?: string; style?: string }]));

  return (
    <div
      ref={host}
      className="canvas-host"
      data-testid="canvas"
      tabIndex={0}
      data-view={JSON.stringify(view)}
      data-tool-state={state.tool.name}
      data-scale-bar={`${bar.text} ${state.doc.unit} = ${bar.pixels} px`}
    >
      <Stage
        width={size.width}
        height={size.height}
        onMouseDown={(e) => {
          const q = pointer(e);
          if (!q) return;
          if (e.evt.button === 1 || e.evt.button === 2 || (e.evt.button === 0 && e.evt.ctrlKey)) {
            pan.current = { start: q.screen, view };
          } else if (e.evt.button === 0) {
            host.current?.focus();
            editor.pointerDown(input(e.evt, q.p));
          } else {
            return;
          }
          // Follow the gesture on the window, so a drag that leaves the canvas still moves and ends.
          const rect = host.current?.getBoundingClientRect();
          const at = (ev: MouseEvent): { screen: Vec; p: Vec } => {
            const screen: Vec = [ev.clientX - (rect?.left ?? 0), ev.clientY - (rect?.top ?? 0)];
            return { screen, p: toSection(viewRef.current, screen) };
          };
          const move = (ev: MouseEvent): void => {
            const m = at(ev);
            props.onCursor(m.p);
            if (pan.current) {
              const s0 = pan.current;
              onView({ ...s0.view, ox: s0.view.ox + m.screen[0] - s0.start[0], oy: s0.view.oy + m.screen[1] - s0.start[1] });
            } else {
              editor.pointerMove(input(ev, m.p));
            }
          };
          const up = (ev: MouseEvent): void => {
            window.removeEventListener('mousemove', move);
            window.removeEventListener('mouseup', up);
            dragging.current = false;
            if (pan.current) pan.current = null;
            else editor.pointerUp(input(ev, at(ev).p));
          };
          dragging.current = true;
          window.addEventListener('mousemove', move);
          window.addEventListener('mouseup', up);
        }}
        onMouseMove={(e) => {
          if (dragging.current) return;
          const q = pointer(e);
          if (!q) return;
          props.onCursor(q.p);
          editor.pointerMove(input(e.evt, q.p));
        }}
        onMouseLeave={() => props.onCursor(null)}
        onContextMenu={(e) => e.evt.preventDefault()}
        onWheel={(e) => {
          e.evt.preventDefault();
          const q = pointer(e);
          if (!q) return;
          onView(zoomAt(view, Math.exp(-e.evt.deltaY * 0.0015), q.screen));
        }}
      >
        <Layer listening={false}>
          <GridAndRulers view={view} width={size.width} height={size.height} unit={state.doc.unit} />
        </Layer>
        <Layer listening={false}>
          {adds.map((x) => (
            <PartShape key={x.part.id} o={x.o as PartOutline} view={view} subtract={false} selected={selected.has(x.part.id)} style={inUse.length > 1 ? styles.get(materialOf(x.part.material)) : undefined} />
          ))}
          {subs.map((x) => (
            <PartShape key={x.part.id} o={x.o as PartOutline} view={view} subtract selected={selected.has(x.part.id)} />
          ))}
        </Layer>
        {stressParts && (
          <Layer listening={false}>
            {stressParts.items}
          </Layer>
        )}
        <Layer listening={false}>
          {resultParts?.items}
          {dimParts.items}
          <DiagnosticMarks diagnostics={props.diagnostics} view={view} />
        </Layer>
        <Layer listening={false}>
          <Group x={bar.box.x} y={bar.box.y}>
            <Rect width={bar.box.width} height={bar.box.height} fill={COLOURS.paper} opacity={0.85} cornerRadius={2} />
            <Line points={[6, 18, 6 + bar.pixels, 18]} stroke={COLOURS.dimension} strokeWidth={2} />
            <Line points={[6, 13, 6, 22]} stroke={COLOURS.dimension} strokeWidth={1} />
            <Line points={[6 + bar.pixels, 13, 6 + bar.pixels, 22]} stroke={COLOURS.dimension} strokeWidth={1} />
            <Text x={6} y={2} text={`${bar.text} ${state.doc.unit}`} fontSize={11} fill={COLOURS.dimension} />
          </Group>
          <MaterialLegend entries={legend} width={size.width} />
          {placed.map((l) => {
            const style = labelStyle.get(l.id);
            return (
              <Label key={l.id} x={l.x} y={l.y}>
                <Tag fill={COLOURS.paper} opacity={0.85} cornerRadius={2} />
                <Text text={l.text} fontSize={style?.fontSize ?? 11} fontStyle={style?.style || 'normal'} fill={style?.colour || COLOURS.dimension} padding={2} />
              </Label>
            );
          })}
        </Layer>
        {props.layers}
        <Layer listening={false}>
          <InteractionOverlay state={state} outlines={outlines} view={view} />
        </Layer>
      </Stage>
      <ul className="canvas-labels" data-testid="canvas-labels" aria-label="Labels on the drawing">
        {placed.map((l) => (
          <li key={l.id} data-testid="canvas-label" data-label={l.id} data-box={`${l.x} ${l.y} ${l.width} ${l.height}`}>
            {l.text}
          </li>
        ))}
      </ul>
    </div>
  );
}
