export interface StoredEntry {
  lastModified: number;
  value: unknown;
  bytes: number;
  tags: string[];
  cacheControl?: unknown;
}
export type CachedAnswer = { lastModified: number; value: unknown; cacheControl?: unknown };

export function storedBytes(value: unknown): number | null;

export class BoundedStore {
  constructor(maxBytes: number, forget?: (key: string) => void);
  maxBytes: number;
  forget: (key: string) => void;
  bytes: number;
  entries: Map<string, StoredEntry>;
  revalidatedAt: Map<string, number>;
  get(key: string): Promise<CachedAnswer | null>;
  set(key: string, value: unknown, context?: { tags?: string[]; cacheControl?: unknown }): Promise<void>;
  revalidateTag(tags: string | string[]): Promise<void>;
  delete(key: string, options?: { forget?: boolean }): void;
}

export default class BoundedCacheHandler {
  constructor(context?: { maxMemoryCacheSize?: number });
  store: BoundedStore;
  get(key: string): Promise<CachedAnswer | null>;
  set(key: string, value: unknown, context?: { tags?: string[]; cacheControl?: unknown }): Promise<void>;
  revalidateTag(tags: string | string[]): Promise<void>;
  resetRequestCache(): void;
}
