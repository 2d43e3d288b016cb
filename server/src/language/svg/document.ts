/**
 * The frame every hover image shares: an SVG document with a light
 * background of its own (hovers are dark or light with the editor's theme,
 * and an image cannot follow it), a title for assistive technology, and the
 * markdown that embeds it as a data URI — editors do not typeset LaTeX in
 * hovers, but they do show images.
 */

/** Text as XML character data or an attribute value. */
export function escapeXml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&apos;' })[c]!);
}

/** The largest SVG a hover carries; bigger results are shown as text only. */
export const MAX_SVG_BYTES = 8 * 1024;

/** The monospace stack of the editors' own code fonts, so entries read as in the code blocks beside them. */
export const MONOSPACE = 'ui-monospace,Menlo,Consolas,monospace';

/**
 * A complete SVG document of the given size (in CSS pixels). `style` holds
 * the rules of the picture's classes, so the body repeats no attributes.
 */
export function svgDocument(width: number, height: number, title: string, style: string, body: readonly string[]): string {
  const w = Math.ceil(width);
  const h = Math.ceil(height);
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" width="${w}" height="${h}" viewBox="0 0 ${w} ${h}" role="img" aria-label="${escapeXml(title)}">` +
    `<title>${escapeXml(title)}</title>` +
    `<style>${style}</style>` +
    `<rect width="${w}" height="${h}" rx="4" fill="#fff"/>` +
    body.join('') +
    '</svg>'
  );
}

/** The byte length of the SVG as UTF-8, what the size bound is about. */
export function byteLength(svg: string): number {
  return new TextEncoder().encode(svg).length;
}

function base64(text: string): string {
  const bytes = new TextEncoder().encode(text);
  let binary = '';
  for (const b of bytes) binary += String.fromCharCode(b);
  return btoa(binary);
}

/** Alt text on one line, with the characters that would end it escaped. */
function altText(alt: string): string {
  return alt.replace(/\s+/g, ' ').trim().replace(/[\\[\]]/g, (c) => `\\${c}`);
}

/** `![alt](data:image/svg+xml;base64,…)`: the image in hover markdown. */
export function svgImageMarkdown(alt: string, svg: string): string {
  return `![${altText(alt)}](data:image/svg+xml;base64,${base64(svg)})`;
}

/** A number for an attribute: integers as such, others to one decimal. */
export function n(x: number): string {
  return Number.isInteger(x) ? String(x) : x.toFixed(1);
}
