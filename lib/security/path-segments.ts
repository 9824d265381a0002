/**
 * Whether every segment of a path decodes as percent-encoded UTF-8 (RFC 3986 §2.1, RFC 3629).
 * Next.js answers 500 for one that does not (`/s/%FF`, `/size/%`, a lone surrogate such as
 * `/learn/%ED%A0%80`) before any page or route of ours runs, so proxy.ts checks first.
 */
export function pathDecodes(pathname: string): boolean {
  return pathname.split("/").every((segment) => {
    try {
      decodeURIComponent(segment);
      return true;
    } catch {
      return false;
    }
  });
}
