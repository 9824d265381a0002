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
  for (;;) {
    const quote = cellOpeningQuote(source, at);
    pieces.push(source.slice(at, quote).replace(/\r\n?/g, "\n"));
    if (quote === source.length) return pieces.join("");
    at = closingQuote(source, quote + 1);
    pieces.push(source.slice(quote, at));
  }
}

const SEPARATORS = ",\r\n";

/** The next double quote from `from` that opens a quoted cell (first in the file, or just after a separator); the end of the text when none does. */
function cellOpeningQuote(source: string, from: number): number {
  for (let quote = source.indexOf('"', from); quote >= 0; quote = source.indexOf('"', quote + 1)) {
    if (quote === 0 || SEPARATORS.includes(source[quote - 1]!)) return quote;
  }
  return source.length;
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
