"use client";
import { CartesianGrid, Legend, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";

export type ChartPoint = { day: number; at: string; ammonia: number | null; nitrite: number | null; nitrate: number | null };

// Each line has its own dash pattern as well as its own colour, so the chart reads without colour.
const SERIES = [
  { key: "ammonia", name: "Ammonia", color: "#b3261e", dash: undefined, axis: "low" },
  { key: "nitrite", name: "Nitrite", color: "#c98a13", dash: "8 4", axis: "low" },
  { key: "nitrate", name: "Nitrate", color: "#0f5e5a", dash: "2 4", axis: "high" },
] as const;

// Lines are straight between tests: a smooth curve would suggest values nobody measured.

/** Ammonia and nitrite on the left axis, nitrate (much larger numbers) on the right, over days of the cycle. */
export function CycleChart({ points, today }: { points: ChartPoint[]; today: number }) {
  return (
    <div className="h-72 w-full" role="img" aria-label="Chart of ammonia, nitrite and nitrate over the days of the cycle; the same readings are in the table below.">
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={points} margin={{ top: 8, right: 16, bottom: 24, left: 8 }}>
          <CartesianGrid stroke="#ddd6c8" strokeDasharray="3 3" />
          <XAxis
            dataKey="day"
            type="number"
            domain={[(min: number) => Math.min(0, Math.floor(min)), (max: number) => Math.max(today, Math.ceil(max))]}
            allowDecimals={false}
            label={{ value: "Days since the cycle began", position: "insideBottom", offset: -12, fontSize: 12 }}
            tick={{ fontSize: 12 }}
          />
          <YAxis yAxisId="low" tick={{ fontSize: 12 }} label={{ value: "Ammonia, nitrite (mg/L)", angle: -90, position: "insideLeft", fontSize: 12, dy: 70 }} />
          <YAxis yAxisId="high" orientation="right" tick={{ fontSize: 12 }} label={{ value: "Nitrate (mg/L)", angle: 90, position: "insideRight", fontSize: 12, dy: -40 }} />
          <Tooltip
            formatter={(value, name) => [`${value} mg/L`, name]}
            labelFormatter={(day) => `Day ${day}`}
          />
          <Legend verticalAlign="top" height={28} />
          {SERIES.map((s) => (
            <Line
              key={s.key}
              yAxisId={s.axis}
              type="linear"
              dataKey={s.key}
              name={s.name}
              stroke={s.color}
              strokeWidth={2}
              strokeDasharray={s.dash}
              dot={{ r: 3 }}
              connectNulls
              isAnimationActive={false}
            />
          ))}
        </LineChart>
      </ResponsiveContainer>
    </div>
  );
}
