import type { Point } from "@/lib/plans/calibration";
import { VTick } from "./v-tick";

/** A line between two picked points (screen px) with V ticks at the ends and its length written at the middle. */
export function DimensionLine({ a, b, color, text, dashed, name }: { a: Point; b: Point | null; color: string; text?: string; dashed?: boolean; name: string }) {
  const mid = b ? { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 } : a;
  return (
    <g>
      {b && (
        <>
          <line x1={a.x} y1={a.y} x2={b.x} y2={b.y} stroke="white" strokeWidth={4} strokeLinecap="round" />
          <line x1={a.x} y1={a.y} x2={b.x} y2={b.y} stroke={color} strokeWidth={1.5} strokeDasharray={dashed ? "6 4" : undefined} />
        </>
      )}
      <VTick x={a.x} y={a.y} color={color} label={`${name} first point`} />
      {b && !dashed && <VTick x={b.x} y={b.y} color={color} label={`${name} second point`} />}
      {text && (
        <text
          x={mid.x}
          y={mid.y - 10}
          textAnchor="middle"
          className="text-[13px] font-bold"
          fill={color}
          stroke="white"
          strokeWidth={4}
          paintOrder="stroke"
          strokeLinejoin="round"
        >
          {text}
        </text>
      )}
    </g>
  );
}
