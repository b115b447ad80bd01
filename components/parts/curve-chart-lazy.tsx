"use client";

import dynamic from "next/dynamic";

/** The part's curve chart, loaded when the page shows it (Chart.js stays out of the page's first load). */
export const CurveChart = dynamic(() => import("./curve-chart").then((m) => m.CurveChart), {
  ssr: false,
  loading: () => <div className="h-56 animate-pulse rounded bg-line/30" aria-busy="true" aria-label="Loading the chart" />,
});
