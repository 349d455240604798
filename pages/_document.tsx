import { Head, Html, Main, NextScript } from "next/document";
import { BODY_CLASS_NAME, SkipLink } from "@/components/ui/site-document";

/** The html and body of the Pages Router's pages, as app/layout.tsx draws them for the App Router's. */
export default function TrimrailDocument() {
  return (
    <Html lang="en">
      <Head />
      <body className={BODY_CLASS_NAME}>
        <SkipLink />
        <Main />
        {/* Renders nothing on a page that turns its runtime off, as the landing page does. */}
        <NextScript />
      </body>
    </Html>
  );
}
