/** The text rules every field shares, free of zod so that browser code can check them too. */

// C0 controls but tab, line feed and carriage return; DEL; the C1 controls. Nobody types them, and
// PostgreSQL cannot store NUL in text at all.
const CONTROL = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F]/;
const LINE_BREAK_OR_TAB = /[\t\n\r]/;

export const CONTROL_CHARACTER_MESSAGE = "Remove the control characters (such as NUL) from this text";

/** Whether text holds a character no form field takes; `multiLine` allows tabs and line breaks. */
export function hasControlCharacters(text: string, { multiLine = false }: { multiLine?: boolean } = {}): boolean {
  return CONTROL.test(text) || (!multiLine && LINE_BREAK_OR_TAB.test(text));
}

/**
 * The path of the first string in a parsed value (a JSON body, a query) that holds a control
 * character other than a tab or a line break, or null. The safety net behind the per-field rules.
 */
export function findControlCharacters(value: unknown, path: (string | number)[] = []): (string | number)[] | null {
  if (typeof value === "string") return hasControlCharacters(value, { multiLine: true }) ? path : null;
  if (Array.isArray(value)) {
    for (const [index, item] of value.entries()) {
      const found = findControlCharacters(item, [...path, index]);
      if (found) return found;
    }
    return null;
  }
  if (typeof value === "object" && value !== null) {
    for (const [key, item] of Object.entries(value)) {
      const found = findControlCharacters(key, [...path, key]) ?? findControlCharacters(item, [...path, key]);
      if (found) return found;
    }
  }
  return null;
}
