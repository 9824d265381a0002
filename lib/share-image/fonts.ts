import { readFile } from "node:fs/promises";
import path from "node:path";

/** The app's own fonts, as the share-image renderer needs them (WOFF; it cannot read WOFF2). */
export async function shareImageFonts() {
  const load = (file: string) => readFile(path.join(process.cwd(), "fonts", file));
  const [regular, semibold, mono] = await Promise.all([
    load("IBMPlexSans-400-latin.woff"),
    load("IBMPlexSans-600-latin.woff"),
    load("JetBrainsMono-600-latin.woff"),
  ]);
  return [
    { name: "Plex", data: regular, weight: 400 as const, style: "normal" as const },
    { name: "Plex", data: semibold, weight: 600 as const, style: "normal" as const },
    { name: "Mono", data: mono, weight: 600 as const, style: "normal" as const },
  ];
}

export const shareImageSize = { width: 1200, height: 630 };
