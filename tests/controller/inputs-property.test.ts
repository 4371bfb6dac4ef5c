/**
 * Property (fast-check, fixed seed): a quantity of any kind stored by the member and stress panels
 * (length, force, line load, moment, stress), typed with any unit of its kind into a field of any
 * document's unit system, then taken through every pair of document units and every display
 * choice, saved and reopened, reads back the same physical value to 1e-12 relative. Identity:
 * the value is stored once in SI, and nothing after the reading may change it.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { memberInputsOf, serialiseDocument, stressInputsOf } from '../../core/document/index.ts';
import type { MemberInputs, SectionDocument, StressInputs } from '../../core/document/types.ts';
import { KINDS, LENGTH_UNITS, type LengthUnit, type QuantityKind } from '../../core/units/index.ts';
import { DISPLAY_CHOICES } from '../../renderer/controller/controller.ts';
import { documentFromText } from '../../renderer/controller/files.ts';
import { memberFields, withAllowable, withMemberValue, type MemberFieldKey } from '../../renderer/app/member/member-model.ts';
import { readField, type InputField } from '../../renderer/app/shell/quantity-text.ts';
import { stressFields } from '../../renderer/app/stress/stress.ts';
import { rig } from './fakes.ts';

type Slot = { kind: QuantityKind; field: (unit: LengthUnit) => InputField; put: (d: SectionDocument, si: number) => SectionDocument; get: (d: SectionDocument) => number };

const member = (key: MemberFieldKey): Slot['put'] => (d, si) => ({ ...d, member: withMemberValue(memberInputsOf(d), key, si) });
const memberGet = (f: (m: MemberInputs) => number): Slot['get'] => (d) => f(memberInputsOf(d));
const stress = (key: keyof StressInputs): Pick<Slot, 'put' | 'get'> => ({ put: (d, si) => ({ ...d, stress: { ...stressInputsOf(d), [key]: si } }), get: (d) => stressInputsOf(d)[key] });
const docOf = (unit: LengthUnit): SectionDocument => ({ format: 'sectionsmith-section', version: 1, name: 'x', unit, parts: [], materials: [], defaultMaterial: null });

const SLOTS: readonly Slot[] = [
  { kind: 'length', field: (u) => memberFields(u).span, put: member('span'), get: memberGet((m) => m.span) },
  { kind: 'lineLoad', field: (u) => memberFields(u).liveW, put: member('liveW'), get: memberGet((m) => m.live.uniform) },
  { kind: 'force', field: (u) => memberFields(u).deadP, put: member('deadP'), get: memberGet((m) => m.dead.points[0]?.P ?? NaN) },
  { kind: 'moment', field: (u) => stressFields(docOf(u)).Mx, ...stress('Mx') },
  { kind: 'force', field: (u) => stressFields(docOf(u)).Vy, ...stress('Vy') },
  {
    kind: 'stress', field: (u) => ({ label: 'allowable', kind: 'stress', unit: u === 'in' || u === 'ft' ? 'ksi' : 'MPa' }),
    put: (d, si) => ({ ...d, materials: [{ id: 'm', name: 'm' }], member: withAllowable(memberInputsOf(d), 'm', 'bending', si) }),
    get: (d) => memberInputsOf(d).allowables?.[0]?.bending ?? NaN,
  },
];

describe('typed quantities keep their physical value (fast-check, seed 11)', () => {
  it('through every pair of document units, every display choice, and save and reopen: 1e-12 relative', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: SLOTS.length - 1 }),
        fc.double({ min: 1e-3, max: 1e6, noNaN: true }),
        fc.nat(),
        fc.constantFrom(...LENGTH_UNITS),
        (slotIndex, magnitude, unitPick, start) => {
          const slot = SLOTS[slotIndex]!;
          const units = KINDS[slot.kind].units;
          const typedUnit = units[unitPick % units.length]!;
          // A span must be positive; loads and forces may be either sign.
          const value = slot.kind === 'length' || slot.kind === 'stress' ? magnitude : unitPick % 2 === 0 ? magnitude : -magnitude;
          const r = rig();
          r.c.changeUnit(start);
          const field = slot.field(start);
          const text = `${value} ${typedUnit}`;
          const read = readField(text, field);
          if (!read.ok) throw new Error(read.message);
          r.c.editor.liveDocument((d) => slot.put(d, read.si));
          r.c.editor.commitLive('typed');
          const si = read.si;
          for (const to of LENGTH_UNITS) {
            for (const from of LENGTH_UNITS) {
              r.c.changeUnit(from);
              r.c.changeUnit(to);
              for (const d of DISPLAY_CHOICES) r.c.setDisplay(d.id);
              expect(Math.abs(slot.get(r.c.editor.getState().doc) - si)).toBeLessThanOrEqual(1e-12 * Math.abs(si));
              // The same text typed into that document's field reads the same value.
              const again = readField(text, slot.field(to));
              expect(again.ok && Math.abs(again.si - si) <= 1e-12 * Math.abs(si)).toBe(true);
            }
          }
          const back = documentFromText(serialiseDocument(r.c.editor.getState().sectionFile), 'x.section.json', 'mm');
          if (!back.ok) throw new Error(back.errors.join('; '));
          expect(Math.abs(slot.get(back.doc) - si)).toBeLessThanOrEqual(1e-12 * Math.abs(si));
          r.c.dispose();
        },
      ),
      { seed: 11, numRuns: 60 },
    );
  });
});
