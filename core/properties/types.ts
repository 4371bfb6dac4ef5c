/**
 * Result contract of core/properties. All values are in the region's length unit
 * (area L², moments L⁴, moduli L³, radii L). Sign convention, used everywhere:
 * Ixy = +∫ X·Y dA about the centroid; angles counter-clockwise from +x (docs/methods.md §0, §1.5).
 */

/** Raw integrals about a stated origin (ox, oy): A, ∫x dA, ∫y dA, ∫x² dA, ∫y² dA, ∫xy dA in local coordinates x−ox, y−oy. */
export interface RawIntegrals {
  readonly originX: number;
  readonly originY: number;
  readonly A: number;
  readonly Qx: number; // ∫ y dA
  readonly Qy: number; // ∫ x dA
  readonly Ixx: number; // ∫ y² dA
  readonly Iyy: number; // ∫ x² dA
  readonly Ixy: number; // ∫ x y dA
}

export interface SectionProperties {
  readonly area: number;
  readonly cx: number;
  readonly cy: number;
  /** Centroidal second moments about axes parallel to x and y, and the product (+∫XY dA). */
  readonly Ix: number;
  readonly Iy: number;
  readonly Ixy: number;
  /** Polar moment about the centroid, Ix + Iy (NOT the torsion constant). */
  readonly Ip: number;
  readonly I1: number;
  readonly I2: number;
  /** Angle of the I1 axis, CCW from +x, in (−90°, 90°]; 0 when isotropic. */
  readonly thetaDeg: number;
  readonly isotropic: boolean;
  readonly rx: number;
  readonly ry: number;
  readonly r1: number;
  readonly r2: number;
  readonly xMin: number;
  readonly xMax: number;
  readonly yMin: number;
  readonly yMax: number;
  readonly SxTop: number;
  readonly SxBottom: number;
  readonly SyLeft: number;
  readonly SyRight: number;
  /** Principal moduli: S1 about axis 1 (distance v to the + and − sides), S2 about axis 2. */
  readonly S1Plus: number;
  readonly S1Minus: number;
  readonly S2Plus: number;
  readonly S2Minus: number;
  /** Plastic moduli and plastic neutral axis positions: pnaY is the y of the PNA for bending about x; pnaX the x of the PNA for bending about y. */
  readonly Zx: number;
  readonly Zy: number;
  readonly Z1: number;
  readonly Z2: number;
  readonly pnaY: number;
  readonly pnaX: number;
  /** Zx / min(SxTop, SxBottom) and Zy / min(SyLeft, SyRight). */
  readonly shapeFactorX: number;
  readonly shapeFactorY: number;
}
