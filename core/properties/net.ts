/**
 * Net-section properties: the section less its fastener holes (bolt, rivet and pin holes). A
 * fastener hole exists only where the fastener is, so the member's stiffness, deflection,
 * torsion and plastic moduli use the gross section; the net section is what a tension or
 * net-section flexure check at the hole line deducts (common practice; AISC 360-22 §B4.3
 * b defines the net area). Only the elastic quantities a net-section check reads are given:
 * An, the net centroid (the net neutral axis for bending about x and y), Ix,net, Iy,net,
 * Ixy,net and the elastic moduli to each extreme fibre.
 *
 * Units: the region's length unit (L², L, L⁴, L³). Same conventions and accuracy as
 * sectionProperties (two-pass integrals about the centroid, docs/methods.md §1.3; moduli §4).
 * Assumes a normalised, valid region of positive area (throws an InvariantError otherwise).
 */
import { invariant } from '../invariant.ts';
import type { Region } from '../geometry/types.ts';
import { regionIntegrals } from './integrals.ts';
import { elasticModuli } from './moduli.ts';
import { principalAxes } from './principal.ts';
import { centroidalFromIntegrals } from './section.ts';

export interface NetSectionProperties {
  /** An: net area. */
  readonly area: number;
  /** Net centroid: the net neutral axis for bending about x passes through cy, about y through cx. */
  readonly cx: number;
  readonly cy: number;
  readonly Ix: number;
  readonly Iy: number;
  readonly Ixy: number;
  readonly SxTop: number;
  readonly SxBottom: number;
  readonly SyLeft: number;
  readonly SyRight: number;
}

/** The net-section properties of a normalised region (the gross section less its fastener holes). */
export function netSectionProperties(region: Region): NetSectionProperties {
  const first = centroidalFromIntegrals(regionIntegrals(region));
  invariant(first.A > 0, `netSectionProperties: the net region's area is ${first.A}`);
  const c = centroidalFromIntegrals(regionIntegrals(region, first.cx, first.cy));
  const p = principalAxes(c.Ix, c.Iy, c.Ixy);
  const s = elasticModuli(region, { cx: c.cx, cy: c.cy, Ix: c.Ix, Iy: c.Iy, I1: p.I1, I2: p.I2, thetaDeg: p.thetaDeg });
  return { area: c.A, cx: c.cx, cy: c.cy, Ix: c.Ix, Iy: c.Iy, Ixy: c.Ixy, SxTop: s.SxTop, SxBottom: s.SxBottom, SyLeft: s.SyLeft, SyRight: s.SyRight };
}
