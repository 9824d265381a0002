/**
 * Every e-mail Sidewise sends, as blocks of plain words: the HTML version (email-document.tsx, through
 * React, which escapes every text) and the text version (email-text.ts) are both rendered from the
 * same blocks, so they never say different things.
 */
export type EmailBlock =
  | { kind: "eyebrow"; text: string }
  | { kind: "title"; text: string }
  | { kind: "heading"; text: string }
  | { kind: "paragraph"; lines: string[] }
  /** A labelled link: a button in HTML (with the address spelt out below), the address alone in text. */
  | { kind: "button"; label: string; href: string }
  | { kind: "list"; items: string[] }
  /** "Label: value" rows, such as the fields of a request. */
  | { kind: "fields"; rows: [string, string][] }
  /** Someone's own words set apart, such as a note from the shop. */
  | { kind: "note"; title: string; text: string }
  | { kind: "caution"; text: string };

export interface EmailMessage {
  subject: string;
  blocks: EmailBlock[];
}

export interface RenderedEmail {
  subject: string;
  text: string;
  html: string;
}

export const paragraph = (...lines: string[]): EmailBlock => ({ kind: "paragraph", lines });

/**
 * A header value on one line: line breaks and other control characters (which a driver's text may
 * hold, and which would start a new header) become spaces, and runs of spaces one.
 */
export const headerText = (text: string): string => text.replace(/[\u0000-\u001f\u007f]+/g, " ").replace(/ {2,}/g, " ").trim();
