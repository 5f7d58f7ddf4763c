export type TextPart = { kind: "text"; text: string } | { kind: "link"; text: string; href: string };

// http(s) URLs up to whitespace or an angle bracket; trailing sentence punctuation is not part of the link.
const URL_PATTERN = /https?:\/\/[^\s<>"]+/g;
const TRAILING = /[.,;:!?)\]'"]+$/;

/** Splits plain text into text and link parts so links in an e-mail body can be clicked. */
export function linkify(text: string): TextPart[] {
  const parts: TextPart[] = [];
  let last = 0;
  for (const match of text.matchAll(URL_PATTERN)) {
    const start = match.index;
    let url = match[0];
    const trailing = TRAILING.exec(url);
    if (trailing) url = url.slice(0, url.length - trailing[0].length);
    if (!url) continue;
    if (start > last) parts.push({ kind: "text", text: text.slice(last, start) });
    parts.push({ kind: "link", text: url, href: url });
    last = start + url.length;
  }
  if (last < text.length) parts.push({ kind: "text", text: text.slice(last) });
  return parts;
}
