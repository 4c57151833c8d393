"use client";

import { CartesianGrid, Line, LineChart, ReferenceDot, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";

/** The pump's head–flow curve (display units) with the design operating point marked. */
export function PumpCurveChart({ curve, point, flowUnit, pressureUnit }: {
  curve: { flow: number; head: number }[]; point: { flow: number; head: number } | null; flowUnit: string; pressureUnit: string;
}) {
  return (
    <div className="h-56 w-full" data-testid="pump-curve-chart">
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={curve} margin={{ top: 8, right: 16, bottom: 20, left: 4 }}>
          <CartesianGrid stroke="#f1ece3" />
          <XAxis dataKey="flow" type="number" domain={[0, "dataMax"]} tick={{ fontSize: 11 }}
            label={{ value: `flow (${flowUnit})`, position: "insideBottom", offset: -10, fontSize: 11 }} />
          <YAxis type="number" domain={[0, "auto"]} tick={{ fontSize: 11 }} width={44}
            label={{ value: `head (${pressureUnit})`, angle: -90, position: "insideLeft", fontSize: 11 }} />
          <Tooltip formatter={(v) => (typeof v === "number" ? v.toFixed(2) : String(v))} labelFormatter={(l) => `flow ${Number(l).toFixed(3)}`} />
          <Line type="monotone" dataKey="head" name="pump head" stroke="#b4632b" strokeWidth={2} dot={{ r: 2 }} isAnimationActive={false} />
          {point && <ReferenceDot x={point.flow} y={point.head} r={5} fill="#2b5fc8" stroke="#fff" label={{ value: "duty", position: "top", fontSize: 11 }} />}
        </LineChart>
      </ResponsiveContainer>
    </div>
  );
}
