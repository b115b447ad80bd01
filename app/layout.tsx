import type { Metadata } from "next";
import type { ReactNode } from "react";
import { SiteHeader } from "@/components/shell/site-header";
import { Providers } from "@/components/shell/providers";
import { inter, mono } from "./fonts";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Sinkwise", template: "%s · Sinkwise" },
  description: "Thermal budget of an LED retrofit: emitter, driver, cells and charger in the real housing.",
  // Our own icon (public/): a finned heatsink under a warm emitter.
  icons: {
    icon: [{ url: "/favicon.ico", sizes: "16x16 32x32 48x48" }, { url: "/icon.svg", type: "image/svg+xml" }, { url: "/icon-192.png", sizes: "192x192", type: "image/png" }],
    apple: "/apple-touch-icon.png",
  },
};

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en" className={`${inter.variable} ${mono.variable}`}>
      <body className="min-h-screen font-sans antialiased">
        <Providers>
          <SiteHeader />
          <main className="mx-auto w-full max-w-6xl px-4 py-8">{children}</main>
          <footer className="no-print mx-auto max-w-6xl px-4 pb-10 text-xs text-ink-soft">
            Sinkwise gives estimates. A thermocouple test of the real build is the final word; mains
            wiring follows local codes and licensed practice.
          </footer>
        </Providers>
      </body>
    </html>
  );
}
