"use client";

import dynamic from "next/dynamic";

/** The bench chart, loaded when shown (Chart.js stays out of the page's first load). */
export const FitChart = dynamic(() => import("./fit-chart").then((m) => m.FitChart), {
  ssr: false,
  loading: () => <div className="h-64 animate-pulse rounded bg-line/30" aria-busy="true" aria-label="Loading the chart" />,
});
