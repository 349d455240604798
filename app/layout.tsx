import type { Metadata } from "next";
import type { ReactNode } from "react";
import "@fontsource/space-grotesk/400.css";
import "@fontsource/space-grotesk/700.css";
import "./globals.css";
import { BODY_CLASS_NAME, SITE_DESCRIPTION, SITE_NAME, SkipLink } from "@/components/ui/site-document";

export const metadata: Metadata = {
  title: { default: SITE_NAME, template: `%s · ${SITE_NAME}` },
  description: SITE_DESCRIPTION,
};

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en">
      <body className={BODY_CLASS_NAME}>
        <SkipLink />
        {children}
      </body>
    </html>
  );
}
