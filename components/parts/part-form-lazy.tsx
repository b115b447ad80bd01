"use client";

import dynamic from "next/dynamic";

/**
 * The part form, loaded after the page: it checks every field in the browser with the
 * parts' schemas and the unit reader, too heavy for the page's first load.
 */
export const PartForm = dynamic(() => import("./part-form").then((m) => m.PartForm), {
  ssr: false,
  loading: () => <div className="h-96 animate-pulse rounded bg-line/30" aria-busy="true" aria-label="Loading the form" />,
});
