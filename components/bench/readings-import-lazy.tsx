"use client";

import dynamic from "next/dynamic";

/** The logger import, loaded after the page: it reads the file and its units in the browser. */
export const ReadingsImport = dynamic(() => import("./readings-import").then((m) => m.ReadingsImport), {
  ssr: false,
  loading: () => <div className="h-24 animate-pulse rounded bg-line/30" aria-busy="true" aria-label="Loading the import" />,
});
