/** A piece of a mail's text: plain, or a link to follow. */
export interface MailPart {
  readonly text: string;
  readonly href: string | null;
}

const LINK = /https?:\/\/[^\s<>"')]+/g;

/** Splits plain mail text into text and http(s) links, so links can be followed without rendering any HTML. */
export function mailParts(text: string): MailPart[] {
  const parts: MailPart[] = [];
  let last = 0;
  for (const match of text.matchAll(LINK)) {
    const url = match[0].replace(/[.,;:]+$/, '');
    if (match.index > last) {
      parts.push({ text: text.slice(last, match.index), href: null });
    }
    parts.push({ text: url, href: url });
    last = match.index + url.length;
  }
  if (last < text.length) {
    parts.push({ text: text.slice(last), href: null });
  }
  return parts;
}
