import type { Metadata } from "next";
import { connection } from "next/server";
import { mono, sans, serif } from "@/app/fonts";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Foldwright", template: "%s · Foldwright" },
  description: "Files the documents of small law and accounting offices.",
};

// Every page renders per request: its scripts carry that request's CSP nonce (proxy.ts).
export default async function RootLayout({ children }: { children: React.ReactNode }) {
  await connection();
  return (
    <html lang="en" className={`${sans.variable} ${serif.variable} ${mono.variable}`}>
      <body className="min-h-screen bg-paper font-sans text-ink antialiased">{children}</body>
    </html>
  );
}
