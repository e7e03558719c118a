"use client";
import { CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { SawtoothPoint } from "@/lib/service/water-change";

/** The settled routine drawn over a few changes: a steady rise, then a drop at each change. */
export function SawtoothChart({ points, limitMgL }: { points: SawtoothPoint[]; limitMgL: number }) {
  const top = Math.max(limitMgL, ...points.map((p) => p.nitrateMgL));
  return (
    <div className="h-48 w-full" role="img" aria-label="Chart of nitrate over a few water changes once the routine has settled, with the limit as a dashed line; the figures are above.">
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={points} margin={{ top: 8, right: 16, bottom: 20, left: 0 }}>
          <CartesianGrid stroke="#ddd6c8" strokeDasharray="3 3" />
          <XAxis dataKey="day" type="number" domain={[0, "dataMax"]} allowDecimals={false} tick={{ fontSize: 12 }} label={{ value: "Days", position: "insideBottom", offset: -10, fontSize: 12 }} />
          <YAxis tick={{ fontSize: 12 }} width={44} domain={[0, Math.ceil(top * 1.1)]} label={{ value: "mg/L", angle: -90, position: "insideLeft", fontSize: 12 }} />
          <Tooltip formatter={(v) => [`${Number(v).toFixed(1)} mg/L`, "Nitrate"]} labelFormatter={(d) => `Day ${Number(d).toFixed(1)}`} />
          <ReferenceLine y={limitMgL} stroke="#b3261e" strokeDasharray="6 4" label={{ value: `Limit ${limitMgL} mg/L`, position: "insideTopRight", fontSize: 12 }} />
          <Line type="linear" dataKey="nitrateMgL" name="Nitrate" stroke="#0f5e5a" strokeWidth={2} dot={false} isAnimationActive={false} />
        </LineChart>
      </ResponsiveContainer>
    </div>
  );
}
