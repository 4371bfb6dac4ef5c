/** Beam formulas and member checks (docs/methods.md §10); see beam.ts and check.ts. */
export * from './beam.ts';
export * from './check.ts';
export * from './section-member.ts';
export * from './shear.ts';
export * from './verdict.ts';
export * from './case.ts';
