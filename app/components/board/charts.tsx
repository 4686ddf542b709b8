import { useEffect, useState } from "react";
import { Bar, CartesianGrid, ComposedChart, Legend, Line, LineChart, ResponsiveContainer, XAxis, YAxis } from "recharts";

/** Charts measure the page, so they draw after hydration; the tables beside them carry the same numbers. */
function useMounted() {
  const [mounted, setMounted] = useState(false);
  useEffect(() => setMounted(true), []);
  return mounted;
}

export function ParetoChart({ rows }: { rows: { label: string; count: number; cumulative: number }[] }) {
  const mounted = useMounted();
  if (!mounted) return <div className="h-80" aria-hidden />;
  return (
    <div className="h-80" aria-hidden>
      <ResponsiveContainer width="100%" height="100%">
        <ComposedChart data={rows} margin={{ top: 8, right: 16, bottom: 48, left: 56 }} accessibilityLayer={false}>
          <CartesianGrid stroke="#c9cec7" vertical={false} />
          <XAxis dataKey="label" angle={-35} textAnchor="end" interval={0} tick={{ fontSize: 12, fill: "#101418" }} height={90} />
          <YAxis yAxisId="n" allowDecimals={false} tick={{ fill: "#101418" }} width={44} />
          <YAxis yAxisId="pct" orientation="right" domain={[0, 100]} tickFormatter={(v) => `${v}%`} tick={{ fill: "#101418" }} width={48} />
          <Bar yAxisId="n" dataKey="count" name="Cases" fill="#0f4a2c" />
          <Line yAxisId="pct" dataKey="cumulative" name="Running share %" stroke="#7f1111" strokeWidth={3} dot={false} />
          <Legend verticalAlign="top" height={28} wrapperStyle={{ color: "#101418" }} />
        </ComposedChart>
      </ResponsiveContainer>
    </div>
  );
}

export function TrendChart({ weeks }: { weeks: { weekStart: string; cases: number; handoffs: number }[] }) {
  const mounted = useMounted();
  if (!mounted) return <div className="h-64" aria-hidden />;
  return (
    <div className="h-64" aria-hidden>
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={weeks} margin={{ top: 8, right: 8, bottom: 8, left: 0 }} accessibilityLayer={false}>
          <CartesianGrid stroke="#c9cec7" vertical={false} />
          <XAxis dataKey="weekStart" tick={{ fontSize: 12, fill: "#101418" }} minTickGap={24} />
          <YAxis allowDecimals={false} tick={{ fill: "#101418" }} width={36} />
          <Line dataKey="cases" name="Cases" stroke="#0f4a2c" strokeWidth={3} dot={false} />
          <Line dataKey="handoffs" name="Hand-offs" stroke="#7f1111" strokeWidth={2} strokeDasharray="6 3" dot={false} />
          <Legend verticalAlign="top" height={28} wrapperStyle={{ color: "#101418" }} />
        </LineChart>
      </ResponsiveContainer>
    </div>
  );
}
