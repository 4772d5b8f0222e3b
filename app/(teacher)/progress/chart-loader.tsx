"use client";
import dynamic from "next/dynamic";
import type { ChartSeries } from "./tempo-chart";

/** recharts is loaded only here, on the progress page. */
const TempoChart = dynamic(() => import("./tempo-chart").then((m) => m.TempoChart), {
  ssr: false,
  loading: () => <div className="h-72 animate-pulse rounded-xl bg-paper" />,
});

export function ProgressChart(props: { data: Record<string, string | number | null>[]; series: ChartSeries[] }) {
  return <TempoChart {...props} />;
}
