"use client";
import { CartesianGrid, Legend, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";

export interface ChartSeries {
  key: string;
  label: string;
}

const COLOURS = ["#5b3a29", "#d08a3c", "#56735e", "#a5402c", "#7a5440", "#3d6a8a"];

/** The axis runs from a round ten below the slowest tempo to a round ten above the fastest. */
const lowEnd = (min: number) => Math.max(0, Math.floor((min - 5) / 10) * 10);
const highEnd = (max: number) => Math.ceil((max + 5) / 10) * 10;

/**
 * Tempo reached over time, one line per drill. With a single entry there is no line yet, so each
 * dot carries its value and a note says the line starts with the next entry.
 */
export function TempoChart({ data, series }: { data: Record<string, string | number | null>[]; series: ChartSeries[] }) {
  const single = data.length === 1;
  return (
    <figure aria-label="Tempo reached over time" data-testid="tempo-chart" className="flex w-full flex-col gap-2">
      <div className="h-72 w-full">
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={data} margin={{ top: 20, right: 16, bottom: 8, left: 0 }}>
            <CartesianGrid stroke="#e7dccc" strokeDasharray="3 3" />
            <XAxis dataKey="day" tick={{ fontSize: 12 }} />
            <YAxis unit=" bpm" width={70} tick={{ fontSize: 12 }} domain={[lowEnd, highEnd]} allowDecimals={false} />
            <Tooltip />
            <Legend />
            {series.map((s, i) => (
              <Line
                key={s.key}
                type="monotone"
                dataKey={s.key}
                name={s.label}
                stroke={COLOURS[i % COLOURS.length]}
                strokeWidth={2}
                connectNulls
                dot={{ r: single ? 5 : 3 }}
                label={single ? { position: "top", fontSize: 12, fill: COLOURS[i % COLOURS.length], formatter: (v: unknown) => `♩ ${v}` } : false}
                isAnimationActive={false}
              />
            ))}
          </LineChart>
        </ResponsiveContainer>
      </div>
      {single ? (
        <figcaption className="text-sm text-muted" data-testid="tempo-chart-single">
          One entry so far ({data[0].day}):{" "}
          {series.filter((s) => data[0][s.key] != null).map((s) => `${s.label} ♩ ${data[0][s.key]}`).join(" · ")}. The line
          over time starts with the next entry.
        </figcaption>
      ) : null}
    </figure>
  );
}
