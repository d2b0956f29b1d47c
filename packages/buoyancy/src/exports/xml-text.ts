/**
 * Text made safe for XML element content and attribute values (XML 1.0 section 2.4: `<` and `&`
 * must be escaped; `>` and quotes are escaped so the same text works inside attributes).
 * Characters XML 1.0 does not allow at all (most C0 controls) are dropped, since no escape
 * makes them legal (section 2.2).
 */
export function xmlText(value: string): string {
  return value
    .replace(/[^\t\n\r\u0020-\uD7FF\uE000-\uFFFD\u{10000}-\u{10FFFF}]/gu, '')
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&apos;');
}

/** `<name>text</name>` with the text escaped, or nothing when there is no text. */
export function xmlElement(name: string, text: string | undefined): string {
  return text === undefined ? '' : `<${name}>${xmlText(text)}</${name}>`;
}
