"use client";

import {
  BarElement,
  CategoryScale,
  Chart as ChartJS,
  Filler,
  Legend,
  LinearScale,
  LineElement,
  PointElement,
  Tooltip,
} from "chart.js";

// Registered once for every chart on the Budget screen (tree-shaken Chart.js).
ChartJS.register(CategoryScale, LinearScale, BarElement, LineElement, PointElement, Filler, Tooltip, Legend);
ChartJS.defaults.font.family = "var(--font-inter), system-ui, sans-serif";
ChartJS.defaults.color = "#6b6158";
ChartJS.defaults.animation = false;

export { SERIES_COLOURS } from "./chart-colours";
