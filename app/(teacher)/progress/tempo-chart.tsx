"use client";
import { CartesianGrid, Legend, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";

export interface ChartSeries {
  key: string;
  label: string;
}

const COLOURS = ["#5b3a29", "#d08a3c", "#56735e", "#a5402c", "#7a5440", "#3d6a8a"];

/** Tempo reached over time, one line per drill. */
export function TempoChart({ data, series }: { data: Record<string, string | number | null>[]; series: ChartSeries[] }) {
  return (
    <figure aria-label="Tempo reached over time" data-testid="tempo-chart" className="h-72 w-full">
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={data} margin={{ top: 8, right: 16, bottom: 8, left: 0 }}>
          <CartesianGrid stroke="#e7dccc" strokeDasharray="3 3" />
          <XAxis dataKey="day" tick={{ fontSize: 12 }} />
          <YAxis unit=" bpm" width={70} tick={{ fontSize: 12 }} domain={["dataMin - 10", "dataMax + 10"]} allowDecimals={false} />
          <Tooltip />
          <Legend />
          {series.map((s, i) => (
            <Line key={s.key} type="monotone" dataKey={s.key} name={s.label} stroke={COLOURS[i % COLOURS.length]} strokeWidth={2} connectNulls dot isAnimationActive={false} />
          ))}
        </LineChart>
      </ResponsiveContainer>
    </figure>
  );
}
