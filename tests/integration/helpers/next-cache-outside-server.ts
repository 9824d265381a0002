// `next/cache` as a route runs outside a Next.js server (a test calling the handler itself): there is
// no data cache to read through, so a cached read reads the database each time, and expiring a tag
// has nothing to expire. Use it as `vi.mock("next/cache", () => import("../helpers/next-cache-outside-server"))`.
import { vi } from "vitest";

export const unstable_cache = <Read extends (...args: never[]) => Promise<unknown>>(read: Read): Read => read;
export const revalidateTag = vi.fn();
export const revalidatePath = vi.fn();
