/** Stresses under N, Mx, My and the kern (docs/methods.md §9); see each module's header. */
export * from './normal-stress.ts';
export * from './kern.ts';
export * from './field.ts';
