/**
 * Built-in library of GENERIC materials. Every value carries its source; values typed from
 * memory (not re-read from the source document while writing this file) say "from memory".
 * Check them against the current edition of the source before relying on them.
 *
 * Stresses are in each entry's `stressUnit` (as published); densities in kg/m³, converted
 * exactly from lb/ft³ where the source gives lb/ft³.
 *
 * Wood: NDS reference design values are for normal load duration, dry service, and before the
 * adjustment factors (C_D, C_M, C_F, C_r, …) — they are not strengths to compare a stress with
 * directly. The shear modulus of wood is taken as E/16 (common practice, from memory).
 */
import { densityToKgPerM3 } from './quantities.ts';
import { validateMaterial, type Material } from './schema.ts';

const pcf = (lbPerFt3: number): number => densityToKgPerM3(lbPerFt3, 'lb/ft3');

const AISC_STEEL = 'AISC 360-16 Specification and AISC Steel Construction Manual 15th ed. (E = 29,000 ksi, G = 11,200 ksi, 490 lb/ft³; common practice, from memory)';
const ADM = 'Aluminum Design Manual 2015, Part A Table A.3.3 / A.3.4, unwelded (from memory)';
const NDS_4A = 'NDS Supplement 2018, Table 4A visually graded dimension lumber 2–4 in thick (from memory)';
const NDS_4B = 'NDS Supplement 2018, Table 4B visually graded Southern Pine, 2–4 in thick, 10 in wide (from memory)';
const WOOD_DENSITY = 'typical density near 12–15 % moisture content (generic, from memory)';
const WOOD_G = 'G ≈ E/16 for wood (common practice, from memory)';

function steel(id: string, name: string, fy: number, fu: number, grade: string): Material {
  return {
    id, name, kind: 'steel', stressUnit: 'ksi',
    E: 29000, G: 11200, density: pcf(490), fy, fu, strengthBasis: 'yield',
    sources: { E: AISC_STEEL, G: AISC_STEEL, density: AISC_STEEL, fy: `${grade} minimum yield (from memory)`, fu: `${grade} minimum tensile (from memory)` },
    fromMemory: true,
  };
}

function aluminium(id: string, name: string, fy: number, fu: number): Material {
  return {
    id, name, kind: 'aluminium', stressUnit: 'ksi',
    E: 10100, G: 3800, density: pcf(0.098 * 1728), fy, fu, strengthBasis: 'yield',
    sources: { E: ADM, G: ADM, density: `${ADM}: 0.098 lb/in³`, fy: `${ADM}: Fty`, fu: `${ADM}: Ftu` },
    fromMemory: true,
    note: 'Unwelded values; welding lowers the strength in the heat-affected zone.',
  };
}

function lumber(id: string, name: string, E: number, Emin: number, Fb: number, densityPcf: number, source: string): Material {
  return {
    id, name, kind: 'sawn-lumber', stressUnit: 'psi',
    E, G: E / 16, density: pcf(densityPcf), fy: Fb, Fb, Emin, strengthBasis: 'reference-bending',
    sources: { E: source, Emin: source, Fb: source, fy: `${source}: reference Fb, not a yield strength`, G: WOOD_G, density: WOOD_DENSITY },
    fromMemory: true,
    note: 'Reference design values before adjustment factors (NDS); not for direct comparison with stress.',
  };
}

function engineered(id: string, name: string, E: number, Emin: number, Fb: number, densityPcf: number): Material {
  const source = 'generic typical value, not any manufacturer\'s data (from memory)';
  return {
    id, name, kind: 'engineered-wood', stressUnit: 'psi',
    E, G: E / 16, density: pcf(densityPcf), fy: Fb, Fb, Emin, strengthBasis: 'reference-bending',
    sources: { E: source, Emin: source, Fb: source, fy: `${source}: reference Fb`, G: WOOD_G, density: source },
    fromMemory: true,
    note: 'Use the manufacturer\'s published values for design.',
  };
}

function plastic(id: string, name: string, E: number, nu: number, density: number, fy: number): Material {
  const source = 'typical room-temperature short-term value (generic, from memory)';
  return {
    id, name, kind: 'plastic', stressUnit: 'MPa',
    E, nu, density, fy, strengthBasis: 'tensile',
    sources: { E: source, nu: source, density: source, fy: `${source}: tensile strength at yield` },
    fromMemory: true,
    note: 'Plastics creep: long-term stiffness is much lower than the short-term E.',
  };
}

export const BUILT_IN_MATERIALS: readonly Material[] = [
  steel('astm-a992', 'Steel ASTM A992 (Fy 50 ksi)', 50, 65, 'ASTM A992'),
  steel('astm-a36', 'Steel ASTM A36 (Fy 36 ksi)', 36, 58, 'ASTM A36'),
  steel('astm-a500c-rect', 'Steel ASTM A500 Gr. C rectangular HSS (Fy 50 ksi)', 50, 62, 'ASTM A500 Grade C, rectangular HSS'),
  steel('astm-a500c-round', 'Steel ASTM A500 Gr. C round HSS (Fy 46 ksi)', 46, 62, 'ASTM A500 Grade C, round HSS'),
  aluminium('al-6061-t6', 'Aluminium 6061-T6', 35, 38),
  aluminium('al-6063-t5', 'Aluminium 6063-T5 (up to 0.5 in)', 16, 22),
  aluminium('al-6063-t6', 'Aluminium 6063-T6', 25, 30),
  lumber('df-l-no2', 'Douglas Fir-Larch No. 2', 1_600_000, 580_000, 900, 34, NDS_4A),
  lumber('df-l-ss', 'Douglas Fir-Larch Select Structural', 1_900_000, 690_000, 1500, 34, NDS_4A),
  lumber('spf-no2', 'Spruce-Pine-Fir No. 1/No. 2', 1_400_000, 510_000, 875, 28, NDS_4A),
  lumber('hem-fir-no2', 'Hem-Fir No. 2', 1_300_000, 470_000, 850, 29, NDS_4A),
  lumber('sp-no2-2x10', 'Southern Pine No. 2 (2×10)', 1_400_000, 510_000, 800, 36, NDS_4B),
  engineered('lvl-2.0e', 'LVL, generic 2.0E', 2_000_000, 1_016_000, 2600, 42),
  engineered('glulam-24f-1.8e', 'Glulam, generic 24F-1.8E', 1_800_000, 950_000, 2400, 35),
  plastic('hdpe', 'HDPE', 1000, 0.42, 955, 25),
  plastic('pvc-rigid', 'PVC, rigid (unplasticised)', 3000, 0.38, 1400, 50),
];

/** The built-in material with this id, or undefined. */
export function builtInMaterial(id: string): Material | undefined {
  return BUILT_IN_MATERIALS.find((m) => m.id === id);
}

/** Every built-in entry passes the same schema a user's material must pass. */
export function builtInLibraryIssues(): string[] {
  return BUILT_IN_MATERIALS.flatMap((m, i) => validateMaterial(m, i).issues.map((issue) => issue.message));
}
