/**
 * What the joints panel and its canvas layer share and the document does not keep: the joint
 * chosen in the list, whether the shear-flow diagram is drawn, and the typed shears, electrode
 * strength and fastener capacity (each with the unit a bare number means, fixed when it was
 * typed, so switching the document unit never changes what a typed value means).
 * A small external store (subscribe / getState) for useSyncExternalStore.
 */
import type { DesignMethod } from '../../../core/joints/index.ts';
import type { QuantityText } from './joints-model.ts';

export interface JointsUi {
  /** jointKey of the joint chosen in the list, or null. */
  readonly selected: string | null;
  readonly diagram: boolean;
  readonly Vy: QuantityText;
  readonly Vx: QuantityText;
  readonly fexx: QuantityText;
  readonly capacity: QuantityText;
  readonly method: DesignMethod;
}

export const INITIAL_JOINTS_UI: JointsUi = {
  selected: null,
  diagram: false,
  Vy: { text: '', unit: 'kN' },
  Vx: { text: '', unit: 'kN' },
  // E70XX electrodes, the common choice (common practice); the text carries its unit.
  fexx: { text: '70 ksi', unit: 'ksi' },
  capacity: { text: '', unit: 'kN' },
  method: 'LRFD',
};

export class JointsStore {
  private state: JointsUi = INITIAL_JOINTS_UI;
  private readonly listeners = new Set<() => void>();

  readonly subscribe = (fn: () => void): (() => void) => {
    this.listeners.add(fn);
    return () => this.listeners.delete(fn);
  };

  readonly getState = (): JointsUi => this.state;

  set(patch: Partial<JointsUi>): void {
    this.state = { ...this.state, ...patch };
    for (const fn of this.listeners) fn();
  }
}
