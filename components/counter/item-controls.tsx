import { useSyncExternalStore } from "react";

const noSubscription = () => () => {};

/** False in the server's HTML and until the page is hydrated: controls that only work with JavaScript wait for it. */
export function useHydrated(): boolean {
  return useSyncExternalStore(noSubscription, () => true, () => false);
}

export const itemInputClass = "min-h-11 w-full rounded border border-rule bg-paper px-3 text-base aria-invalid:border-danger";
