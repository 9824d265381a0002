import type { Metadata, Viewport } from "next";
import localFont from "next/font/local";
import type { ReactNode } from "react";
import { ShopContactLine } from "@/components/shell/shop-contact";
import { SiteFooter } from "@/components/shell/site-footer";
import { readCachedShopContact } from "@/lib/shop/shop-cache";
import { SiteHeader } from "@/components/shell/site-header";
import { siteUrl } from "@/lib/env/site-url";
import "./globals.css";

const plexSans = localFont({
  src: "../fonts/IBMPlexSans-Variable-latin.woff2",
  weight: "100 700",
  variable: "--font-plex-sans",
  display: "swap",
});

const jetbrainsMono = localFont({
  src: "../fonts/JetBrainsMono-Variable-latin.woff2",
  weight: "100 800",
  variable: "--font-jetbrains-mono",
  display: "swap",
});

export const metadata: Metadata = {
  metadataBase: siteUrl(),
  title: { default: "Sidewise — read your tire's sidewall", template: "%s · Sidewise" },
  description:
    "Type what is printed on your tire's sidewall and see every part explained, drawn to scale, with equal-or-better replacements from the shop's stock.",
  applicationName: "Sidewise",
};

export const viewport: Viewport = {
  themeColor: [
    { media: "(prefers-color-scheme: light)", color: "#f5f3ec" },
    { media: "(prefers-color-scheme: dark)", color: "#14181d" },
  ],
};

// The contact comes from the cache, refreshed when the shop's settings change: no page is rendered
// per request for it, and pages that read nothing else stay static.
async function FooterContact() {
  return <ShopContactLine contact={await readCachedShopContact()} />;
}

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en" className={`${plexSans.variable} ${jetbrainsMono.variable}`}>
      <body className="flex min-h-dvh flex-col antialiased">
        <a
          href="#main"
          className="sr-only focus:not-sr-only focus:fixed focus:top-2 focus:left-2 focus:z-50 focus:rounded focus:bg-sheet focus:px-3 focus:py-2"
        >
          Skip to content
        </a>
        <SiteHeader />
        <main id="main" className="mx-auto w-full max-w-6xl flex-1 px-4 py-6 sm:py-10 print:p-0">
          {children}
        </main>
        <SiteFooter contact={<FooterContact />} />
      </body>
    </html>
  );
}
