"use client";
import dynamic from "next/dynamic";

/** The growth chart loads after the page (the charting library stays out of its first load); the placeholder keeps its height. */
export const GrowthChartLazy = dynamic(() => import("./growth-chart").then((m) => m.GrowthChart), {
  ssr: false,
  loading: () => <div className="h-48 w-full" aria-hidden="true" />,
});
