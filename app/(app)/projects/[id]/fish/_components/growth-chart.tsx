"use client";
import { CartesianGrid, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { format } from "date-fns";

export type GrowthPoint = { t: number; lengthCm: number };

/** One group's measured length over time; straight lines between measurements, which the list beside it repeats. */
export function GrowthChart({ name, points }: { name: string; points: GrowthPoint[] }) {
  return (
    <div className="h-48 w-full" role="img" aria-label={`Growth of ${name}: length measured over time; the measurements are listed in the history.`}>
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={points} margin={{ top: 8, right: 16, bottom: 8, left: 8 }}>
          <CartesianGrid stroke="#ddd6c8" strokeDasharray="3 3" />
          <XAxis dataKey="t" type="number" scale="time" domain={["dataMin", "dataMax"]} tickFormatter={(t: number) => format(new Date(t), "d MMM")} tick={{ fontSize: 12 }} />
          <YAxis domain={[0, (max: number) => Math.ceil(max)]} allowDecimals={false} tick={{ fontSize: 12 }} label={{ value: "cm", angle: -90, position: "insideLeft", fontSize: 12 }} />
          <Tooltip formatter={(v) => [`${v} cm`, "Length"]} labelFormatter={(t) => format(new Date(Number(t)), "d MMM yyyy")} />
          <Line type="linear" dataKey="lengthCm" stroke="#0f5e5a" strokeWidth={2} dot={{ r: 3 }} isAnimationActive={false} />
        </LineChart>
      </ResponsiveContainer>
    </div>
  );
}
