import type { Dimension, Elevation, Pt } from "@/lib/takeoffs/elevation";
import { tapeLength } from "@/lib/takeoffs/format";

const path = (points: Pt[]) => `M${points.map((p) => `${p.x} ${p.y}`).join("L")}Z`;

// Fills by piece family so casing, stool and apron read apart; names and dimensions carry the meaning too.
const FILL: Record<string, string> = {
  casing: "fill-maple-200",
  stool: "fill-brass-300",
  apron: "fill-maple-300",
};

/** Strokes stay one screen pixel wide however large the window is drawn. */
const HAIR = { vectorEffect: "non-scaling-stroke" } as const;

function DimensionLine({ d, unit }: { d: Dimension; unit: number }) {
  const above = d.at < d.base;
  const over = 0.6 * unit;
  const tick = 0.45 * unit;
  const text = `${d.label} ${tapeLength(d.value)}`;
  const mid = (d.from + d.to) / 2;
  if (d.axis === "x") {
    const w0 = d.base + (above ? -0.3 : 0.3) * unit;
    const w1 = d.at + (above ? -over : over);
    return (
      <g>
        <path d={`M${d.from} ${w0}V${w1}M${d.to} ${w0}V${w1}M${d.from - over} ${d.at}H${d.to + over}`} className="stroke-brass-500" style={HAIR} />
        <path d={`M${d.from - tick} ${d.at + tick}L${d.from + tick} ${d.at - tick}M${d.to - tick} ${d.at + tick}L${d.to + tick} ${d.at - tick}`} className="stroke-graphite-900" style={HAIR} />
        <text x={mid} y={d.at - 0.45 * unit} textAnchor="middle" fontSize={unit} className="fill-graphite-900">
          {text}
        </text>
      </g>
    );
  }
  const w0 = d.base - 0.3 * unit;
  const w1 = d.at - over;
  return (
    <g>
      <path d={`M${w0} ${d.from}H${w1}M${w0} ${d.to}H${w1}M${d.at} ${d.from - over}V${d.to + over}`} className="stroke-brass-500" style={HAIR} />
      <path d={`M${d.at - tick} ${d.from + tick}L${d.at + tick} ${d.from - tick}M${d.at - tick} ${d.to + tick}L${d.at + tick} ${d.to - tick}`} className="stroke-graphite-900" style={HAIR} />
      <text x={d.at - 0.45 * unit} y={mid} textAnchor="middle" fontSize={unit} transform={`rotate(-90 ${d.at - 0.45 * unit} ${mid})`} className="fill-graphite-900">
        {text}
      </text>
    </g>
  );
}

/**
 * An opening's trim drawn to scale as seen from the room. Hidden (dashed) outlines are the jamb extensions
 * behind the casing; curved pieces are true arcs. The cut list beside it is the text equivalent, so the
 * picture is described briefly.
 */
export function ElevationDrawing({ e, title }: { e: Elevation; title: string }) {
  const { minX, minY, maxX, maxY } = e.bounds;
  const u = e.unit;
  return (
    <svg viewBox={`${minX} ${minY} ${maxX - minX} ${maxY - minY}`} className="h-auto w-full" role="img" aria-label={title}>
      {e.openings.map((o, i) => (
        <g key={`o${i}`}>
          <path d={o.d} className="fill-spruce-50 stroke-graphite-500" style={HAIR} />
          <text x={o.at.x} y={o.at.y - 0.4 * u} textAnchor="middle" fontSize={0.85 * u} className="fill-graphite-600">
            {o.lines[0]}
          </text>
          <text x={o.at.x} y={o.at.y + 0.8 * u} textAnchor="middle" fontSize={0.85 * u} className="fill-graphite-600">
            {o.lines[1]}
          </text>
        </g>
      ))}
      {e.marks.map((m, i) => (
        <g key={`m${i}`}>
          <path
            d={`M${m.line[0].x} ${m.line[0].y}L${m.line[1].x} ${m.line[1].y}`}
            className="stroke-graphite-700"
            strokeWidth={m.kind === "floor" ? 2 : 1}
            strokeDasharray={m.kind === "fold" ? "8 3 2 3" : undefined}
            style={HAIR}
          />
          <text x={m.at.x} y={m.at.y} textAnchor="middle" fontSize={0.85 * u} className="fill-graphite-700">
            {m.text}
          </text>
        </g>
      ))}
      {e.pieces
        .filter((p) => p.hidden)
        .map((p, i) => (
          <path key={`h${i}`} d={p.d ?? path(p.points)} className="fill-none stroke-graphite-600" strokeDasharray="4 3" style={HAIR} />
        ))}
      {e.pieces
        .filter((p) => !p.hidden)
        .map((p, i) => (
          <path key={`p${i}`} d={p.d ?? path(p.points)} className={`${FILL[p.part.split("-")[0]!] ?? FILL.casing} stroke-graphite-900`} strokeWidth={1.25} style={HAIR} />
        ))}
      {e.dimensions.map((d) => (
        <DimensionLine key={d.key} d={d} unit={u} />
      ))}
      {e.radii.map((rl, i) => (
        <g key={`r${i}`}>
          <path d={`M${rl.from.x} ${rl.from.y}L${rl.to.x} ${rl.to.y}`} className="stroke-graphite-900" style={HAIR} />
          <circle cx={rl.to.x} cy={rl.to.y} r={0.25 * u} className="fill-graphite-900" />
          <text x={rl.from.x} y={rl.from.y + 1.1 * u} textAnchor="middle" fontSize={u} className="fill-graphite-900">
            {rl.text}
          </text>
        </g>
      ))}
      {e.callouts.map((c, i) => (
        <g key={`c${i}`}>
          <path d={`M${c.anchor.x} ${c.anchor.y}L${e.calloutX - 0.8 * u} ${c.y - 0.35 * u}H${e.calloutX - 0.3 * u}`} className="fill-none stroke-graphite-500" style={HAIR} />
          <circle cx={c.anchor.x} cy={c.anchor.y} r={0.22 * u} className="fill-graphite-900" />
          <text x={e.calloutX} y={c.y} fontSize={u} className="fill-graphite-900">
            {c.text}
          </text>
        </g>
      ))}
      <g aria-hidden>
        <rect x={e.scaleBar.x} y={e.scaleBar.y} width={6} height={0.4 * u} className="fill-graphite-900" />
        <rect x={e.scaleBar.x + 6} y={e.scaleBar.y} width={6} height={0.4 * u} className="fill-white stroke-graphite-900" style={HAIR} />
        <text x={e.scaleBar.x + 12 + 0.6 * u} y={e.scaleBar.y + 0.45 * u} fontSize={0.85 * u} className="fill-graphite-700">
          1 ft (drawn to scale)
        </text>
      </g>
    </svg>
  );
}
