"use client";

import { useCallback, useRef, useState } from "react";

/**
 * A module kept off the page's first load, fetched the first time `load` is called (a field focused
 * or first typed in). Until it arrives the value is null; a failed fetch is tried again on the next call.
 */
export function useOnDemand<T>(fetchModule: () => Promise<T>): [T | null, () => void] {
  const [loaded, setLoaded] = useState<T | null>(null);
  const started = useRef(false);
  const load = useCallback(() => {
    if (started.current) return;
    started.current = true;
    fetchModule().then(
      (module) => setLoaded(() => module),
      () => {
        started.current = false;
      },
    );
  }, [fetchModule]);
  return [loaded, load];
}
