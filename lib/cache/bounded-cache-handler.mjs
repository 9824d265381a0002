// Plain JavaScript: Next.js loads its cache handler at run time, outside the compiled app.
import { createRequire } from "node:module";
//
// The server's one cache of rendered pages, share images and cached reads (the shop's contact and
// finder settings), held in memory and bounded in bytes (next.config.mjs `cacheMaxMemorySize`),
// the least recently used entry going first. Nothing is written to disk, so a crawler walking
// every possible size sheet costs at most the bound. It starts empty: a page prerendered at build
// (which cannot read the shop's contact) is never served; each is rendered at its first request
// after the server starts, with the database as it is then.

const TAGS_HEADER = "x-next-cache-tags";
const NEXT_LIFETIMES_MODULE = "next/dist/server/lib/incremental-cache/shared-cache-controls.external.js";
const FALLBACK_MAX_BYTES = 32 * 1024 * 1024;

/** @param {{ length?: number } | undefined | null} buffer */
const lengthOf = (buffer) => buffer?.length ?? 0;

/**
 * Roughly how many bytes an entry holds; null for an answer that must not be kept: anything but a
 * 200 (a 404 for a string that is not a size, a redirect to a size's one spelling), so that only
 * pages that exist enter the cache.
 * @param {any} value
 * @returns {number | null}
 */
export function storedBytes(value) {
  if (!value) return null;
  switch (value.kind) {
    case "FETCH":
      return JSON.stringify(value.data ?? "").length;
    case "APP_PAGE": {
      if (value.status !== undefined && value.status !== 200) return null;
      let bytes = lengthOf(value.html) + lengthOf(value.rscData) + lengthOf(value.postponed);
      for (const [path, buffer] of value.segmentData ?? []) bytes += path.length + lengthOf(buffer);
      return bytes;
    }
    case "APP_ROUTE":
      return value.status === undefined || value.status === 200 ? lengthOf(value.body) : null;
    case "IMAGE":
      return lengthOf(value.buffer);
    default:
      return null;
  }
}

/**
 * The tags an entry was made with: a cached read's own, or for a page or a route the tags of the
 * reads it used (which Next.js lists in a header), so that changing the shop drops both.
 * @param {any} value
 * @returns {string[]}
 */
function tagsOf(value) {
  if (value?.kind === "FETCH") return value.tags ?? [];
  const header = value?.headers?.[TAGS_HEADER];
  return typeof header === "string" ? header.split(",") : [];
}

/** Entries by key, least recently used first, within `maxBytes`. */
export class BoundedStore {
  /** @type {Map<string, { lastModified: number, value: any, bytes: number, tags: string[], cacheControl?: unknown }>} */
  entries = new Map();
  /** When each tag was last revalidated: an entry made before that is gone. */
  revalidatedAt = new Map();
  bytes = 0;

  /**
   * @param {number} maxBytes
   * @param {(key: string) => void} [forget] told of every key the store lets go of or refuses
   */
  constructor(maxBytes, forget = () => {}) {
    this.maxBytes = maxBytes;
    this.forget = forget;
  }

  /** @param {string} key */
  async get(key) {
    const entry = this.entries.get(key);
    if (!entry) return null;
    if (entry.tags.some((tag) => (this.revalidatedAt.get(tag) ?? -Infinity) >= entry.lastModified)) {
      this.delete(key);
      return null;
    }
    // Map keeps insertion order: moving the entry to the end makes the first one the least recently used.
    this.entries.delete(key);
    this.entries.set(key, entry);
    const { lastModified, value, cacheControl } = entry;
    return { lastModified, value, cacheControl };
  }

  /**
   * @param {string} key
   * @param {any} value
   * @param {{ tags?: string[], cacheControl?: unknown }} [context]
   */
  async set(key, value, context = {}) {
    this.delete(key, { forget: false });
    const bytes = storedBytes(value);
    const size = bytes === null ? null : key.length + bytes;
    if (size === null || size > this.maxBytes) {
      this.forget(key);
      return;
    }
    const tags = [...new Set([...tagsOf(value), ...(context.tags ?? [])])];
    this.entries.set(key, { lastModified: Date.now(), value, bytes: size, tags, cacheControl: context.cacheControl });
    this.bytes += size;
    for (const [oldest] of this.entries) {
      if (this.bytes <= this.maxBytes) break;
      this.delete(oldest);
    }
  }

  /**
   * Expires at once whatever carries one of the tags, whatever lifetime the caller names: after a
   * change, the next request reads the database again. The entries go within this call (Next.js
   * makes it before the answer to the change is sent), not later.
   * @param {string | string[]} tags
   */
  async revalidateTag(tags) {
    const now = Date.now();
    const revalidated = new Set(typeof tags === "string" ? [tags] : tags);
    for (const tag of revalidated) this.revalidatedAt.set(tag, now);
    for (const [key, entry] of this.entries) {
      if (entry.tags.some((tag) => revalidated.has(tag))) this.delete(key);
    }
  }

  /** @param {string} key @param {{ forget?: boolean }} [options] */
  delete(key, { forget = true } = {}) {
    const entry = this.entries.get(key);
    if (forget) this.forget(key);
    if (!entry) return;
    this.entries.delete(key);
    this.bytes -= entry.bytes;
  }
}

/**
 * Next.js also remembers, in a map of its own that never shrinks, the lifetime of every path it has
 * rendered for the cache, a 404 for any string under /size/ included: about 250 bytes per path, so a
 * crawler inventing paths would grow it without end. The store keeps it to the paths it holds (an
 * entry it answers carries its lifetime back). If a version of Next.js moves the map, nothing breaks:
 * it is left alone, as before.
 * @returns {(key: string) => void}
 */
function forgetNextLifetime() {
  try {
    const lifetimes = createRequire(import.meta.url)(NEXT_LIFETIMES_MODULE).SharedCacheControls?.cacheControls;
    if (lifetimes instanceof Map) return (key) => lifetimes.delete(key);
  } catch {
    // Not found in this version of Next.js.
  }
  return () => {};
}

/** @type {BoundedStore | undefined} */
let shared;

/**
 * Next.js makes a handler per request (and one for optimized images): they all share one store.
 */
export default class BoundedCacheHandler {
  /** @param {{ maxMemoryCacheSize?: number }} [context] */
  constructor(context = {}) {
    shared ??= new BoundedStore(context.maxMemoryCacheSize || FALLBACK_MAX_BYTES, forgetNextLifetime());
    this.store = shared;
  }

  /** @param {string} key */
  get(key) {
    return this.store.get(key);
  }

  /** @param {string} key @param {any} value @param {{ tags?: string[], cacheControl?: unknown }} [context] */
  set(key, value, context) {
    return this.store.set(key, value, context);
  }

  /** @param {string | string[]} tags */
  revalidateTag(tags) {
    return this.store.revalidateTag(tags);
  }

  resetRequestCache() {}
}
