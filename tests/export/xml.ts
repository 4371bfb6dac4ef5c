/**
 * A small, strict XML 1.0 well-formedness checker for the SVG export tests (no DOM in vitest):
 * one root element, every tag closed in order, attributes quoted and not repeated, only the five
 * predefined entities and numeric character references, no stray '<' or '&'. Returns the element
 * tree with decoded attribute values and text, so tests can look inside.
 * Not supported (not produced by the exporter): DOCTYPE, CDATA, processing instructions other
 * than the XML declaration.
 */
export interface XmlElement {
  readonly name: string;
  readonly attributes: Readonly<Record<string, string>>;
  readonly children: XmlElement[];
  /** Decoded text directly inside this element. */
  text: string;
}

const NAME = /^[A-Za-z_:][\w.:-]*/;
const ENTITIES: Readonly<Record<string, string>> = { amp: '&', lt: '<', gt: '>', quot: '"', apos: "'" };

function decode(raw: string, where: number): string {
  if (raw.includes('<')) throw new Error(`XML: '<' in text or attribute value near offset ${where}`);
  return raw.replace(/&([^;]*);|&/g, (match, body: string | undefined) => {
    if (body === undefined) throw new Error(`XML: bare '&' near offset ${where}`);
    if (body in ENTITIES) return ENTITIES[body] ?? '';
    const numeric = /^#(x[0-9a-fA-F]+|[0-9]+)$/.exec(body);
    if (!numeric?.[1]) throw new Error(`XML: unknown entity &${body}; near offset ${where}`);
    const code = numeric[1].startsWith('x') ? parseInt(numeric[1].slice(1), 16) : parseInt(numeric[1], 10);
    return String.fromCodePoint(code);
  });
}

export function parseXml(text: string): XmlElement {
  let i = 0;
  if (text.startsWith('<?xml')) {
    const end = text.indexOf('?>');
    if (end < 0) throw new Error('XML: unterminated declaration');
    i = end + 2;
  }
  if (/[^\t\n\r\u0020-\uD7FF\uE000-\uFFFD\u{10000}-\u{10FFFF}]/u.test(text)) throw new Error('XML: a character XML 1.0 forbids');
  const stack: XmlElement[] = [];
  let root: XmlElement | null = null;
  while (i < text.length) {
    const lt = text.indexOf('<', i);
    const chunk = text.slice(i, lt < 0 ? text.length : lt);
    const top = stack[stack.length - 1];
    if (top) top.text += decode(chunk, i);
    else if (chunk.trim() !== '') throw new Error(`XML: text outside the root element at offset ${i}`);
    if (lt < 0) break;
    if (text.startsWith('<!--', lt)) {
      const end = text.indexOf('-->', lt);
      if (end < 0) throw new Error('XML: unterminated comment');
      i = end + 3;
      continue;
    }
    const gt = text.indexOf('>', lt);
    if (gt < 0) throw new Error(`XML: unterminated tag at offset ${lt}`);
    const tag = text.slice(lt + 1, gt);
    i = gt + 1;
    if (tag.startsWith('/')) {
      const name = tag.slice(1).trim();
      const open = stack.pop();
      if (!open || open.name !== name) throw new Error(`XML: </${name}> closes <${open?.name ?? 'nothing'}> at offset ${lt}`);
      continue;
    }
    const selfClosing = tag.endsWith('/');
    const body = selfClosing ? tag.slice(0, -1) : tag;
    const name = NAME.exec(body)?.[0];
    if (!name) throw new Error(`XML: bad tag name at offset ${lt}`);
    const attributes: Record<string, string> = {};
    let rest = body.slice(name.length);
    const attribute = /^\s+([A-Za-z_:][\w.:-]*)\s*=\s*("([^"]*)"|'([^']*)')/;
    for (let m = attribute.exec(rest); m; m = attribute.exec(rest)) {
      const key = m[1] ?? '';
      if (key in attributes) throw new Error(`XML: attribute ${key} repeated in <${name}>`);
      attributes[key] = decode(m[3] ?? m[4] ?? '', lt);
      rest = rest.slice(m[0].length);
    }
    if (rest.trim() !== '') throw new Error(`XML: malformed attributes in <${name}>: ${JSON.stringify(rest.slice(0, 40))}`);
    const element: XmlElement = { name, attributes, children: [], text: '' };
    const parent = stack[stack.length - 1];
    if (parent) parent.children.push(element);
    else if (root) throw new Error('XML: a second root element');
    else root = element;
    if (!selfClosing) stack.push(element);
  }
  if (stack.length > 0) throw new Error(`XML: <${stack[stack.length - 1]?.name}> is never closed`);
  if (!root) throw new Error('XML: no root element');
  return root;
}

export function findAll(element: XmlElement, test: (e: XmlElement) => boolean): XmlElement[] {
  const found = test(element) ? [element] : [];
  for (const child of element.children) found.push(...findAll(child, test));
  return found;
}

/** All text inside an element, its descendants included. */
export function allText(element: XmlElement): string {
  return element.text + element.children.map(allText).join('');
}
