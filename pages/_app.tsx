import type { AppProps } from "next/app";
import Head from "next/head";
import "@fontsource/space-grotesk/400.css";
import "@fontsource/space-grotesk/700.css";
import "@/app/globals.css";
import { SITE_DESCRIPTION, SITE_NAME } from "@/components/ui/site-document";

// The Pages Router's pages (only the landing page) get the same fonts, styles and head as the App
// Router's root layout gives its own; Next allows global CSS in this file only.
export default function TrimrailApp({ Component, pageProps }: AppProps) {
  return (
    <>
      <Head>
        <title>{SITE_NAME}</title>
        <meta name="description" content={SITE_DESCRIPTION} />
        <meta name="viewport" content="width=device-width, initial-scale=1" />
        {/* The App Router serves app/icon.svg at this address for both routers. */}
        <link rel="icon" href="/icon.svg" type="image/svg+xml" sizes="any" />
      </Head>
      <Component {...pageProps} />
    </>
  );
}
