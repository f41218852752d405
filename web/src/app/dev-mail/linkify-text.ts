/** A run of plain text, or a link found in it. */
export type TextSegment =
  { kind: 'text'; text: string } | { kind: 'link'; text: string; href: string };

// Stops at whitespace and at the brackets and quotes mail text puts around links.
const urlPattern = /https?:\/\/[^\s<>"'()[\]]+/g;
// Sentence punctuation after a link belongs to the sentence, not to the address.
const trailingPunctuation = /[.,;:!?]+$/;

/**
 * Splits mail text into text and http(s) links, so links can be rendered as anchors without
 * ever treating the text as HTML.
 */
export function linkifyText(text: string): TextSegment[] {
  const segments: TextSegment[] = [];
  let last = 0;
  for (const match of text.matchAll(urlPattern)) {
    const start = match.index;
    const href = match[0].replace(trailingPunctuation, '');
    if (start > last) segments.push({ kind: 'text', text: text.slice(last, start) });
    segments.push({ kind: 'link', text: href, href });
    last = start + href.length;
  }
  if (last < text.length) segments.push({ kind: 'text', text: text.slice(last) });
  return segments;
}
