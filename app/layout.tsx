import type { Metadata, Viewport } from "next";
// The link component is used by every segment below (error boundary, not-found, section layouts,
// pages). Imported here it lands in the root layout's chunk, which every page loads first, so those
// segments share that one copy instead of each chunk carrying its own.
import "next/link";
import { figuresFont, headingFont, textFont } from "./fonts";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Knotwork — practice drills from the bars that trip your students", template: "%s · Knotwork" },
  description:
    "Knotwork helps piano teachers turn the bars where a student stumbles into short, engraved practice drills, hand them out, and follow practice between lessons.",
};

export const viewport: Viewport = { themeColor: "#5b3a29", width: "device-width", initialScale: 1 };

export default function RootLayout({ children }: { children: React.ReactNode }) {
  return (
    <html lang="en" className={`${textFont.variable} ${figuresFont.variable} ${headingFont.variable}`}>
      <body className="bg-paper font-sans text-ink antialiased">
        {children}
      </body>
    </html>
  );
}
