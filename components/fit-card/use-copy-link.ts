"use client";

import { useState } from "react";

/** Copies a link to the clipboard and says so; where the browser refuses, the status shows the link to copy by hand. */
export function useCopyLink(): { status: string; copy: (url: string) => Promise<void> } {
  const [status, setStatus] = useState("");
  async function copy(url: string) {
    try {
      await navigator.clipboard.writeText(url);
      setStatus("Link copied.");
    } catch {
      setStatus(`The browser did not allow copying. Copy this link: ${url}`);
    }
  }
  return { status, copy };
}
