/**
 * A half-dial of the onset margin on a logarithmic scale from 0.1× to 10×: crimson below 1,
 * amber from 1 to the alert threshold, teal above; the needle points at the margin (at the end
 * stop when it is off the scale, and at 10× when no onset is possible).
 */
export function MarginGauge({ margin, threshold }: { margin: number | null; threshold: number }) {
  const min = Math.log10(0.1);
  const max = Math.log10(10);
  const radius = 80;
  const cx = 100;
  const cy = 96;
  const fraction = (value: number) => (Math.min(max, Math.max(min, Math.log10(value))) - min) / (max - min);
  const point = (f: number, r = radius) => {
    const angle = Math.PI * (1 - f);
    return [cx + r * Math.cos(angle), cy - r * Math.sin(angle)] as const;
  };
  const arc = (from: number, to: number) => {
    const [x1, y1] = point(from);
    const [x2, y2] = point(to);
    return `M ${x1.toFixed(2)} ${y1.toFixed(2)} A ${radius} ${radius} 0 0 1 ${x2.toFixed(2)} ${y2.toFixed(2)}`;
  };
  const needle = margin === null ? 1 : fraction(margin);
  const [nx, ny] = point(needle, radius - 14);
  const ticks = [0.1, 0.3, 1, 3, 10];
  return (
    <svg viewBox="0 0 200 118" role="img" aria-label={`Gauge: margin ${margin === null ? 'no onset' : margin.toPrecision(3)} on a scale from 0.1 to 10`} className="h-auto w-full max-w-[15rem]">
      <path d={arc(0, fraction(1))} stroke="#b3123c" strokeWidth="14" fill="none" />
      <path d={arc(fraction(1), fraction(threshold))} stroke="#b45309" strokeWidth="14" fill="none" />
      <path d={arc(fraction(threshold), 1)} stroke="#0f766e" strokeWidth="14" fill="none" />
      {ticks.map((tick) => {
        const [x1, y1] = point(fraction(tick), radius + 8);
        const [x2, y2] = point(fraction(tick), radius + 16);
        const [tx, ty] = point(fraction(tick), radius - 24);
        return (
          <g key={tick}>
            <line x1={x1} y1={y1} x2={x2} y2={y2} stroke="#4a5868" strokeWidth="1.5" />
            <text x={tx} y={ty + 4} textAnchor="middle" fontSize="10" fill="#4a5868">
              {tick}
            </text>
          </g>
        );
      })}
      <line x1={cx} y1={cy} x2={nx} y2={ny} stroke="#1d2733" strokeWidth="3.5" strokeLinecap="round" />
      <circle cx={cx} cy={cy} r="6" fill="#1d2733" />
      <text x={cx} y={cy + 19} textAnchor="middle" fontSize="10" fill="#4a5868">
        onset margin ×
      </text>
    </svg>
  );
}
