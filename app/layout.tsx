import type { Metadata } from "next";
import localFont from "next/font/local";
import { connection } from "next/server";
import "./globals.css";

const inter = localFont({
  src: "./inter-latin-wght-normal.woff2",
  variable: "--font-inter",
  display: "swap",
});

export const metadata: Metadata = {
  title: { default: "Heterolane", template: "%s · Heterolane" },
  description:
    "Frequency plans for microwave-photonic radiometers: channels, resonator modes, LO offsets and IF slots, checked on every change.",
};

/**
 * Every page is rendered per request: its Content-Security-Policy carries a
 * fresh nonce (proxy.ts) that Next puts on its scripts, which a page
 * prerendered at build time could not have.
 */
export default async function RootLayout({ children }: { children: React.ReactNode }) {
  await connection();
  return (
    <html lang="en" className={inter.variable}>
      <body className="min-h-screen font-sans">{children}</body>
    </html>
  );
}
