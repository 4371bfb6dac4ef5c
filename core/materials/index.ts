/** Materials: units of force and stress, the stored schema, the generic library, the transformed section. */
export * from './quantities.ts';
export * from './schema.ts';
export * from './library.ts';
export * from './composite.ts';
export * from './widths.ts';
export * from './document.ts';
export * from './reference.ts';
