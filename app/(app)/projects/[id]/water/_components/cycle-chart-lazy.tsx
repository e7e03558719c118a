"use client";
import dynamic from "next/dynamic";

/**
 * The cycle chart loads after the page, so the charting library isn't part of its first load; the
 * placeholder keeps the chart's height so nothing jumps. The same readings are in the table below.
 */
export const CycleChartLazy = dynamic(() => import("./cycle-chart").then((m) => m.CycleChart), {
  ssr: false,
  loading: () => <div className="h-72 w-full" aria-hidden="true" />,
});
