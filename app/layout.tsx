import type { Metadata, Viewport } from "next";
import { connection } from "next/server";
import type { ReactNode } from "react";
import { SiteHeader } from "@/components/shell/site-header";
import { currentActor } from "@/lib/auth/session";
import { devMailboxEnabled } from "@/lib/mail/dev-mailbox";
import { mono, sans, serif } from "./fonts";
import { Providers } from "./providers";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Cordarium", template: "%s · Cordarium" },
  description: "An archive of visual evidence for historical performance practice on plucked instruments.",
  icons: { icon: "/favicon.svg" },
};

export const viewport: Viewport = { width: "device-width", initialScale: 1 };

export default async function RootLayout({ children }: { children: ReactNode }) {
  // Every page depends on who is asking: render at request time, never at build time.
  await connection();
  // A database outage must not take the error pages down with it.
  const actor = await currentActor().catch(() => null);
  return (
    <html lang="en" className={`${serif.variable} ${sans.variable} ${mono.variable}`}>
      <body className="min-h-screen bg-paper text-ink antialiased">
        <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:rounded focus:bg-card focus:px-3 focus:py-2">
          Skip to content
        </a>
        <Providers>
          <SiteHeader actor={actor} devMail={devMailboxEnabled()} />
          <main id="main" className="mx-auto max-w-6xl px-4 py-8">
            {children}
          </main>
          <footer className="mx-auto max-w-6xl border-t border-rule px-4 py-6 text-sm text-ink-faint">
            Image rights and reproduction permissions belong to the holding institutions and their local law.
            Playing advice drawn from old pictures is no substitute for a teacher or, for pain, a health professional.
          </footer>
        </Providers>
      </body>
    </html>
  );
}
