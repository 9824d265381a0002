const UNQUOTED_RUN = /[^,\r\n]*/y;

/**
 * A CSV's text as the readers expect it: no byte-order mark, and every line ending outside a quoted
 * cell written as LF. Spreadsheets write CRLF, editors LF, and a file edited in both holds a mix;
 * papaparse picks one line ending per file, so a mixed file would otherwise read a CR or an LF into
 * a cell. Line breaks inside quoted cells are the cell's own text and stay as they are. A cell is
 * quoted when it starts with a double quote (RFC 4180); a quote further in is an ordinary character,
 * as papaparse reads it.
 */
export function normalizeCsvText(text: string): string {
  const source = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  if (!source.includes("\r")) return source;
  const pieces: string[] = [];
  let at = 0;
  while (at < source.length) {
    if (source[at] === '"') {
      const end = closingQuote(source, at + 1);
      pieces.push(source.slice(at, end));
      at = end;
    }
    UNQUOTED_RUN.lastIndex = at;
    UNQUOTED_RUN.test(source);
    pieces.push(source.slice(at, UNQUOTED_RUN.lastIndex));
    at = UNQUOTED_RUN.lastIndex;
    if (source[at] === "\r") {
      pieces.push("\n");
      at += source[at + 1] === "\n" ? 2 : 1;
    } else if (at < source.length) {
      pieces.push(source[at]!);
      at += 1;
    }
  }
  return pieces.join("");
}

/** Just past the quote that closes a quoted cell whose text starts at `from` (a doubled "" is a quote inside it); the end of the text when none does. */
function closingQuote(source: string, from: number): number {
  let at = from;
  for (;;) {
    const quote = source.indexOf('"', at);
    if (quote < 0) return source.length;
    if (source[quote + 1] !== '"') return quote + 1;
    at = quote + 2;
  }
}
