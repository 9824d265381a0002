import type { MetadataRoute } from "next";
import { siteUrl } from "@/lib/env/site-url";
import { COMMON_SIZES, sizeFromSlug, sizeToSlug } from "@/lib/tire";

export default function sitemap(): MetadataRoute.Sitemap {
  const base = siteUrl();
  const pages = ["/", "/compare", "/plus", "/replace", "/learn"].map((path) => ({
    url: new URL(path, base).toString(),
    changeFrequency: "monthly" as const,
  }));
  const sizeSheets = COMMON_SIZES.flatMap((designation) => {
    const size = sizeFromSlug(designation);
    return size ? [{ url: new URL(`/size/${sizeToSlug(size)}`, base).toString(), changeFrequency: "yearly" as const }] : [];
  });
  return [...pages, ...sizeSheets];
}
