"use client";

import dynamic from "next/dynamic";

/** A Chart.js bar chart, loaded when shown (the chart library stays out of a page's first load). */
export const Bar = dynamic(() => import("./chart-setup").then(() => import("react-chartjs-2")).then((m) => m.Bar), {
  ssr: false,
  loading: () => <div className="h-full min-h-16 animate-pulse rounded bg-line/30" aria-busy="true" aria-label="Loading the chart" />,
});
