/**
 * Splits plain text into text and http(s) link pieces so mail bodies can be shown with
 * clickable links without ever rendering the mail's own HTML.
 */
export type TextPiece = { kind: 'text'; text: string } | { kind: 'link'; href: string };

const URL_PATTERN = /https?:\/\/[^\s<>"']+/g;
// Punctuation that usually ends a sentence rather than a URL.
const TRAILING = /[.,;:!?)\]]+$/;

export function linkify(text: string): TextPiece[] {
  const pieces: TextPiece[] = [];
  let last = 0;
  for (const match of text.matchAll(URL_PATTERN)) {
    const start = match.index ?? 0;
    let href = match[0];
    const trailing = href.match(TRAILING)?.[0] ?? '';
    if (trailing) href = href.slice(0, href.length - trailing.length);
    if (start > last) pieces.push({ kind: 'text', text: text.slice(last, start) });
    pieces.push({ kind: 'link', href });
    last = start + href.length;
  }
  if (last < text.length) pieces.push({ kind: 'text', text: text.slice(last) });
  return pieces;
}
