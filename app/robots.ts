import type { MetadataRoute } from "next";
import { siteUrl } from "@/lib/env/site-url";

export default function robots(): MetadataRoute.Robots {
  return {
    rules: { userAgent: "*", allow: "/", disallow: ["/api/", "/counter", "/account", "/s/", "/o/"] },
    sitemap: new URL("/sitemap.xml", siteUrl()).toString(),
  };
}
