"use client";

import dynamic from "next/dynamic";

/** The owner's sharing panel, loaded after the Heat path (it fetches its list on its own anyway). */
export const MembersPanel = dynamic(() => import("./members-panel").then((m) => m.MembersPanel), {
  ssr: false,
  loading: () => <div className="h-24 animate-pulse rounded bg-line/30" aria-busy="true" aria-label="Loading who can see this build" />,
});
