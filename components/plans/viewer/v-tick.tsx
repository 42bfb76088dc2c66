/**
 * A picked point drawn the way a carpenter marks a board: a "V" whose point sits exactly on the spot, arms
 * opening upward, with a white edge so it reads on dense linework. Screen-sized: it does not grow with zoom.
 */
export function VTick({ x, y, color, label }: { x: number; y: number; color: string; label?: string }) {
  const d = `M ${x - 6} ${y - 12} L ${x} ${y} L ${x + 6} ${y - 12}`;
  return (
    <g aria-label={label} role={label ? "img" : undefined}>
      <path d={d} fill="none" stroke="white" strokeWidth={5} strokeLinecap="round" strokeLinejoin="round" />
      <path d={d} fill="none" stroke={color} strokeWidth={2} strokeLinecap="round" strokeLinejoin="miter" />
    </g>
  );
}
