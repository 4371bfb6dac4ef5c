/**
 * The part of dxf-parser's API that core/dxf/parse.ts uses. Its own typings reference Node's
 * stream types (for parseStream, which core does not use), and core is type-checked without Node
 * (core/tsconfig.json maps the module here).
 */
export default class DxfParser {
  parseSync(source: string): unknown;
  registerEntityHandler(handlerType: new () => unknown): void;
}
