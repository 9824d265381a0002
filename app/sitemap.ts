import type { MetadataRoute } from "next";
import { siteUrl } from "@/lib/env/site-url";
import { commonSizeSlugs } from "@/lib/size-sheet/read-size-sheet";

export default function sitemap(): MetadataRoute.Sitemap {
  const base = siteUrl();
  const pages = ["/", "/compare", "/plus", "/replace", "/wear-match", "/learn"].map((path) => ({
    url: new URL(path, base).toString(),
    changeFrequency: "monthly" as const,
  }));
  const sizeSheets = commonSizeSlugs().map((slug) => ({
    url: new URL(`/size/${slug}`, base).toString(),
    changeFrequency: "yearly" as const,
  }));
  return [...pages, ...sizeSheets];
}
