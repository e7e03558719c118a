"use client";
import { format } from "date-fns";
import { CartesianGrid, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { TrendPoint } from "@/lib/service/trends";
import { toDisplay, unitLabel, type UnitSystem } from "@/lib/tank/units";

type Row = { at: number; value: number | null };

// One small chart per measure, on one time axis: three scales on one chart would need three axes.
// Lines are straight between tests: a smooth curve would suggest values nobody measured.
function SmallChart({ title, unit, rows, color, dash, domain }: { title: string; unit: string; rows: Row[]; color: string; dash?: string; domain: [number, number] }) {
  const measured = rows.filter((r) => r.value !== null);
  return (
    <figure className="flex flex-col gap-1">
      <figcaption className="text-sm font-medium">
        {title} <span className="text-muted">({unit})</span>
      </figcaption>
      {measured.length ? (
        <div className="h-40 w-full">
          <ResponsiveContainer width="100%" height="100%">
            <LineChart data={measured} margin={{ top: 4, right: 16, bottom: 4, left: 0 }}>
              <CartesianGrid stroke="#ddd6c8" strokeDasharray="3 3" />
              <XAxis dataKey="at" type="number" scale="time" domain={domain} tickFormatter={(t: number) => format(t, "d MMM")} tick={{ fontSize: 12 }} />
              <YAxis tick={{ fontSize: 12 }} width={44} domain={["auto", "auto"]} />
              <Tooltip formatter={(v) => [`${v} ${unit}`, title]} labelFormatter={(t) => format(Number(t), "d MMM yyyy")} />
              <Line type="linear" dataKey="value" name={title} stroke={color} strokeWidth={2} strokeDasharray={dash} dot={{ r: 2 }} isAnimationActive={false} />
            </LineChart>
          </ResponsiveContainer>
        </div>
      ) : (
        <p className="text-sm text-muted">Not measured in any test yet.</p>
      )}
    </figure>
  );
}

/** Nitrate, pH and temperature from every valid test, on a shared time axis. */
export function TrendsChart({ points, unitSystem }: { points: TrendPoint[]; unitSystem: UnitSystem }) {
  const first = points[0].at;
  const last = points[points.length - 1].at;
  const domain: [number, number] = [first, Math.max(last, first + 86_400_000)];
  const round1 = (n: number) => Math.round(n * 10) / 10;
  return (
    <div className="flex flex-col gap-4" role="group" aria-label={`Water trends from ${format(first, "d MMM yyyy")} to ${format(last, "d MMM yyyy")}, ${points.length} tests; the readings are in the table on the Water & cycling tab.`}>
      <SmallChart title="Nitrate" unit="mg/L" color="#0f5e5a" rows={points.map((p) => ({ at: p.at, value: p.nitrateMgL }))} domain={domain} />
      <SmallChart title="pH" unit="pH" color="#4a5d78" dash="6 3" rows={points.map((p) => ({ at: p.at, value: p.pH }))} domain={domain} />
      <SmallChart
        title="Temperature"
        unit={unitLabel("temperature", unitSystem)}
        color="#b06a2c"
        dash="2 3"
        rows={points.map((p) => ({ at: p.at, value: p.tempC === null ? null : round1(toDisplay("temperature", p.tempC, unitSystem)) }))}
        domain={domain}
      />
    </div>
  );
}
