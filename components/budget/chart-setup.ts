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

export const SERIES_COLOURS = ["#c2410c", "#2563eb", "#0e7490", "#7c3aed", "#b7791f", "#2f7d4f", "#be185d", "#475569"];
