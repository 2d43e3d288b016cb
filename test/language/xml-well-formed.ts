/**
 * A small XML well-formedness checker for the SVG pictures of the hovers:
 * one root element, properly nested and closed tags, quoted attributes named
 * once each, and only the five predefined entities or character references
 * (the well-formedness constraints of XML 1.0, W3C Recommendation, §2–§4,
 * from memory — as much as a generated SVG can break). It throws on the
 * first violation and returns the element tree, for tests to look inside.
 */

export interface XmlElement {
  name: string;
  attributes: Record<string, string>;
  children: XmlElement[];
  /** The character data directly inside, entities decoded. */
  text: string;
}

const NAME = /^[A-Za-z_][\w.:-]*/;
const ENTITIES: Record<string, string> = { amp: '&', lt: '<', gt: '>', quot: '"', apos: "'" };

function decode(raw: string, where: number): string {
  if (raw.includes('<')) throw new Error(`'<' in character data or an attribute value near offset ${where}`);
  return raw.replace(/&([^;]*);?/g, (whole, body: string) => {
    if (!whole.endsWith(';')) throw new Error(`an unterminated entity reference near offset ${where}`);
    if (body in ENTITIES) return ENTITIES[body]!;
    const hex = /^#x([0-9a-fA-F]+)$/.exec(body);
    const dec = /^#([0-9]+)$/.exec(body);
    if (hex) return String.fromCodePoint(parseInt(hex[1]!, 16));
    if (dec) return String.fromCodePoint(parseInt(dec[1]!, 10));
    throw new Error(`an undefined entity &${body}; near offset ${where}`);
  });
}

export function parseWellFormedXml(xml: string): XmlElement {
  const stack: XmlElement[] = [];
  let root: XmlElement | undefined;
  let i = 0;
  while (i < xml.length) {
    const lt = xml.indexOf('<', i);
    const textEnd = lt < 0 ? xml.length : lt;
    const raw = xml.slice(i, textEnd);
    if (raw.length > 0) {
      if (stack.length === 0) {
        if (raw.trim() !== '') throw new Error(`text outside the root element at offset ${i}`);
      } else {
        stack[stack.length - 1]!.text += decode(raw, i);
      }
    }
    if (lt < 0) break;
    if (xml.startsWith('<!--', lt)) {
      const end = xml.indexOf('-->', lt + 4);
      if (end < 0) throw new Error('an unterminated comment');
      i = end + 3;
      continue;
    }
    const gt = xml.indexOf('>', lt);
    if (gt < 0) throw new Error(`an unterminated tag at offset ${lt}`);
    const inner = xml.slice(lt + 1, gt);
    if (inner.startsWith('/')) {
      const name = inner.slice(1).trim();
      const open = stack.pop();
      if (!open || open.name !== name) throw new Error(`</${name}> closes ${open ? `<${open.name}>` : 'nothing'} at offset ${lt}`);
      i = gt + 1;
      continue;
    }
    const selfClosing = inner.endsWith('/');
    const body = selfClosing ? inner.slice(0, -1) : inner;
    const nameMatch = NAME.exec(body);
    if (!nameMatch) throw new Error(`a tag without a valid name at offset ${lt}`);
    const element: XmlElement = { name: nameMatch[0], attributes: {}, children: [], text: '' };
    let rest = body.slice(nameMatch[0].length);
    while (rest.trim() !== '') {
      const attr = /^\s+([A-Za-z_][\w.:-]*)\s*=\s*("([^"]*)"|'([^']*)')/.exec(rest);
      if (!attr) throw new Error(`a malformed attribute in <${element.name}> at offset ${lt}: ${JSON.stringify(rest.slice(0, 40))}`);
      const key = attr[1]!;
      if (key in element.attributes) throw new Error(`the attribute ${key} twice in <${element.name}>`);
      element.attributes[key] = decode(attr[3] ?? attr[4] ?? '', lt);
      rest = rest.slice(attr[0].length);
    }
    if (stack.length > 0) stack[stack.length - 1]!.children.push(element);
    else if (root) throw new Error(`a second root element <${element.name}>`);
    else root = element;
    if (!selfClosing) stack.push(element);
    i = gt + 1;
  }
  if (stack.length > 0) throw new Error(`<${stack[stack.length - 1]!.name}> is never closed`);
  if (!root) throw new Error('no root element');
  return root;
}

/** Every element of the tree, depth first. */
export function allElements(root: XmlElement): XmlElement[] {
  return [root, ...root.children.flatMap(allElements)];
}
