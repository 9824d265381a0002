/**
 * The shop's time zone: an IANA name (America/New_York) that this runtime can format times in.
 * `Intl.supportedValuesOf("timeZone")` lists ICU's canonical names only: it leaves out "UTC" and
 * the IANA names ICU keeps as aliases of an older spelling (Asia/Kolkata → Asia/Calcutta,
 * Europe/Kyiv → Europe/Kiev, America/Argentina/Buenos_Aires). So a name is accepted when it is on
 * that list or "UTC", or when it is written as an IANA Area/Location name (each part starting with a
 * capital) and `Intl.DateTimeFormat` resolves it to a listed zone. Refused: what Intl does not know,
 * lower-case spellings ("america/new_york"), abbreviations and POSIX names ("EST", "EST5EDT"), and
 * the Etc/GMT±N offsets (their sign is the reverse of what people expect, and they have no rules).
 */

const IANA_SHAPE = /^[A-Z][A-Za-z0-9_+-]*(?:\/[A-Z][A-Za-z0-9_+-]*)+$/;

let listed: ReadonlySet<string> | undefined;
let listedLowerCase: ReadonlySet<string> | undefined;

function listedZones(): ReadonlySet<string> {
  return (listed ??= new Set([...Intl.supportedValuesOf("timeZone"), "UTC"]));
}

/** Whether the name is a listed one in other capitals ("AMERICA/NEW_YORK"). */
const isMisspeltListed = (name: string) => (listedLowerCase ??= new Set([...listedZones()].map((zone) => zone.toLowerCase()))).has(name.toLowerCase());

/** Every time zone a form offers: the runtime's IANA list and UTC, in plain character order. */
export function listTimeZones(): string[] {
  return [...listedZones()].sort();
}

/** The zone `Intl.DateTimeFormat` reads the name as, or null when it refuses it. */
function resolvedZone(name: string): string | null {
  try {
    return new Intl.DateTimeFormat("en-US", { timeZone: name }).resolvedOptions().timeZone;
  } catch {
    return null;
  }
}

/** Whether `name` is a time zone the shop may keep (see the rule above). */
export function isTimeZoneName(name: string): boolean {
  const resolved = resolvedZone(name);
  if (resolved === null) return false;
  if (listedZones().has(name)) return true;
  return IANA_SHAPE.test(name) && !isMisspeltListed(name) && listedZones().has(resolved);
}

export const TIME_ZONE_RULE = "use an IANA time zone name such as America/New_York, Pacific/Honolulu or UTC, spelled with its capitals";
