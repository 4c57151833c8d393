"use client";

import { CartesianGrid, Legend, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { FlowCheck } from "@/lib/rooms/flow-temperature";

/** Share of rooms met and of the total heat loss met against flow temperature (35–75 °C), with the chosen and the lowest flow marked. */
export function FlowChart({ check }: { check: FlowCheck }) {
  const lowest = check.lowestFlowTemperatureC;
  return (
    <div className="h-64 w-full" data-testid="flow-chart" role="img"
      aria-label={`Rooms met against flow temperature; all met from ${lowest === null ? "no temperature" : `${lowest.toFixed(1)} °C`}`}>
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={check.curve} margin={{ top: 8, right: 16, bottom: 20, left: 4 }}>
          <CartesianGrid stroke="#f1ece3" />
          <XAxis dataKey="flowC" type="number" domain={[35, 75]} ticks={[35, 40, 45, 50, 55, 60, 65, 70, 75]} tick={{ fontSize: 11 }}
            label={{ value: `flow temperature (°C), Δt ${check.deltaK} K`, position: "insideBottom", offset: -10, fontSize: 11 }} />
          <YAxis type="number" domain={[0, 100]} tick={{ fontSize: 11 }} width={40} unit="%" />
          <Tooltip formatter={(v) => (typeof v === "number" ? `${v.toFixed(0)} %` : String(v))} labelFormatter={(l) => `flow ${l} °C`} />
          <Legend verticalAlign="top" height={24} wrapperStyle={{ fontSize: 12 }} />
          <Line type="stepAfter" dataKey="roomsMetPercent" name="rooms met" stroke="#b4632b" strokeWidth={2} dot={false} isAnimationActive={false} />
          <Line type="monotone" dataKey="heatMetPercent" name="heat loss met" stroke="#2b5fc8" strokeWidth={2} dot={false} isAnimationActive={false} />
          <ReferenceLine x={check.flowC} stroke="#4a453e" strokeDasharray="4 3" label={{ value: "design", position: "insideTopLeft", fontSize: 11 }} />
          {lowest !== null && lowest >= 35 && lowest <= 75 && (
            <ReferenceLine x={lowest} stroke="#2f7d4f" label={{ value: "all met", position: "insideBottomRight", fontSize: 11 }} />
          )}
        </LineChart>
      </ResponsiveContainer>
    </div>
  );
}
