import type PDFDocument from 'pdfkit';
import type { SnapshotWindow } from '../../../../shared/schemas/sheets';
import { num } from './sheet-format';

type Doc = InstanceType<typeof PDFDocument>;

export interface FigureBox {
  x: number;
  y: number;
  width: number;
  height: number;
}

export interface FigureText {
  (text: string, x: number, y: number, options: { size: number; width?: number; align?: 'left' | 'center' | 'right'; bold?: boolean; color?: string }): void;
}

/** Our figure palette (DESIGN.md: teal quiet, crimson over). */
const colours = {
  quietFill: '#cdebe6',
  quietEdge: '#0f766e',
  cellBoundary: '#9f1239',
  longWave: '#7c3aed',
  axis: '#1f2937',
  grid: '#d1d5db',
  point: '#111827',
};

/** "Nice" tick step (1, 2, 2.5 or 5 × 10^n) for about `count` ticks over `span`. */
export function niceStep(span: number, count: number): number {
  const raw = span / Math.max(1, count);
  const power = 10 ** Math.floor(Math.log10(raw));
  const fraction = raw / power;
  const nice = fraction <= 1 ? 1 : fraction <= 2 ? 2 : fraction <= 2.5 ? 2.5 : fraction <= 5 ? 5 : 10;
  return nice * power;
}

/** Log-axis ticks at 1, 2 and 5 × 10^n inside [min, max]. */
export function logTicks(min: number, max: number): number[] {
  const ticks: number[] = [];
  for (let p = Math.floor(Math.log10(min)); p <= Math.ceil(Math.log10(max)); p += 1) {
    for (const m of [1, 2, 5]) {
      const v = m * 10 ** p;
      if (v >= min * (1 - 1e-9) && v <= max * (1 + 1e-9)) ticks.push(v);
    }
  }
  return ticks;
}

/**
 * The quiet window as vector graphics: depth (log axis) × drive (ΔT or heat flux), the shaded
 * quiet region under the onset boundaries, the cellular and long-wave boundary curves, the
 * operating point, labelled axes with units and ticks, and a legend.
 */
export function drawQuietWindowFigure(doc: Doc, window: SnapshotWindow, box: FigureBox, text: FigureText): void {
  const { depths, drives } = window;
  const plot = { x: box.x + 52, y: box.y + 8, width: box.width - 64, height: box.height - 62 };
  const dMin = depths[0];
  const dMax = depths[depths.length - 1];
  const driveMax = Math.max(drives[drives.length - 1], window.operatingPoint.drive * 1.05);
  const micro = dMax < 2e-3;
  const depthScale = micro ? 1e6 : 1e3;
  const depthUnit = micro ? 'µm' : 'mm';
  const byFlux = window.driveKind === 'heat-flux';
  // Rotated text must be one font run (no Greek letters): pdfkit continues runs along the unrotated line.
  const driveLabel = byFlux ? 'Heat flux through the layer [W/m²]' : 'Temperature difference across the layer [K]';

  const xOf = (d: number) => plot.x + ((Math.log10(d) - Math.log10(dMin)) / (Math.log10(dMax) - Math.log10(dMin))) * plot.width;
  const yOf = (q: number) => plot.y + plot.height - (Math.min(Math.max(q, 0), driveMax) / driveMax) * plot.height;
  // Curves are not clamped: a boundary above the plotted range leaves through the clipped top edge.
  const yOfFree = (q: number) => plot.y + plot.height - (q / driveMax) * plot.height;

  // Grid and ticks.
  doc.save().lineWidth(0.4).strokeColor(colours.grid);
  const xTicks = logTicks(dMin, dMax);
  for (const t of xTicks) doc.moveTo(xOf(t), plot.y).lineTo(xOf(t), plot.y + plot.height).stroke();
  const step = niceStep(driveMax, 5);
  const yTicks: number[] = [];
  for (let v = 0; v <= driveMax * (1 + 1e-9); v += step) yTicks.push(v);
  for (const t of yTicks) doc.moveTo(plot.x, yOf(t)).lineTo(plot.x + plot.width, yOf(t)).stroke();
  doc.restore();

  // Quiet region: below the lowest onset boundary at each depth.
  const limit = depths.map((_d, j) => {
    const candidates = [window.cellBoundary[j], window.longWaveBoundary[j]].filter((v): v is number => v !== null && Number.isFinite(v));
    return candidates.length === 0 ? driveMax : Math.min(driveMax, ...candidates);
  });
  doc.save();
  doc.rect(plot.x, plot.y, plot.width, plot.height).clip();
  doc.moveTo(xOf(depths[0]), yOf(0));
  depths.forEach((d, j) => doc.lineTo(xOf(d), yOf(limit[j])));
  doc.lineTo(xOf(depths[depths.length - 1]), yOf(0)).closePath().fillColor(colours.quietFill).fill();

  const curve = (values: (number | null)[], colour: string, dash: boolean) => {
    doc.save().lineWidth(1.6).strokeColor(colour);
    if (dash) doc.dash(4, { space: 3 });
    let open = false;
    depths.forEach((d, j) => {
      const v = values[j];
      if (v === null || !Number.isFinite(v)) {
        if (open) doc.stroke();
        open = false;
        return;
      }
      if (!open) doc.moveTo(xOf(d), yOfFree(v));
      else doc.lineTo(xOf(d), yOfFree(v));
      open = true;
    });
    if (open) doc.stroke();
    doc.undash().restore();
  };
  curve(window.cellBoundary, colours.cellBoundary, false);
  curve(window.longWaveBoundary, colours.longWave, true);
  doc.restore();

  // Axes.
  doc.save().lineWidth(0.8).strokeColor(colours.axis).rect(plot.x, plot.y, plot.width, plot.height).stroke().restore();
  for (const t of xTicks) {
    doc.save().lineWidth(0.8).strokeColor(colours.axis).moveTo(xOf(t), plot.y + plot.height).lineTo(xOf(t), plot.y + plot.height + 3).stroke().restore();
    text(num(t * depthScale, 3), xOf(t) - 20, plot.y + plot.height + 5, { size: 7, width: 40, align: 'center' });
  }
  for (const t of yTicks) {
    doc.save().lineWidth(0.8).strokeColor(colours.axis).moveTo(plot.x - 3, yOf(t)).lineTo(plot.x, yOf(t)).stroke().restore();
    text(num(t, 3), plot.x - 48, yOf(t) - 4, { size: 7, width: 43, align: 'right' });
  }
  text(`Layer depth d [${depthUnit}], logarithmic`, plot.x, plot.y + plot.height + 16, { size: 8, width: plot.width, align: 'center' });
  // Vertical axis title, rotated.
  doc.save();
  doc.rotate(-90, { origin: [box.x + 6, plot.y + plot.height / 2] });
  text(driveLabel, box.x + 6 - plot.height / 2, plot.y + plot.height / 2 - 4, { size: 8, width: plot.height, align: 'center' });
  doc.restore();

  // Say so when a boundary lies wholly above the plotted drive range (its curve is then not drawn).
  const visible = (values: (number | null)[]) => values.some((v) => v !== null && Number.isFinite(v) && v <= driveMax);
  const hidden = [
    ...(visible(window.cellBoundary) ? [] : ['cell onset']),
    ...(visible(window.longWaveBoundary) ? [] : ['long-wave onset']),
  ];
  if (hidden.length > 0) {
    text(`No ${hidden.join(' or ')} within this range of depth and ${byFlux ? 'heat flux' : 'ΔT'}.`, plot.x + 6, plot.y + 4, { size: 7, width: plot.width - 12 });
  }

  // Operating point.
  const op = window.operatingPoint;
  const ox = xOf(Math.min(Math.max(op.depth, dMin), dMax));
  const oy = yOf(op.drive);
  doc.save().circle(ox, oy, 3.5).fillColor(colours.point).fill().restore();
  doc.save().circle(ox, oy, 6).lineWidth(1).strokeColor(colours.point).stroke().restore();
  const labelLeft = ox > plot.x + plot.width - 110;
  text('Operating point', labelLeft ? ox - 88 : ox + 9, oy - 11, { size: 7.5, bold: true, width: 80, align: labelLeft ? 'right' : 'left' });

  // Legend.
  const ly = plot.y + plot.height + 30;
  let lx = plot.x;
  doc.save().rect(lx, ly + 1, 14, 8).fillColor(colours.quietFill).fill().restore();
  text('Quiet (no onset)', lx + 18, ly, { size: 7.5 });
  lx += 100;
  doc.save().lineWidth(1.6).strokeColor(colours.cellBoundary).moveTo(lx, ly + 5).lineTo(lx + 16, ly + 5).stroke().restore();
  text('Cell onset (margin 1)', lx + 20, ly, { size: 7.5 });
  lx += 118;
  doc.save().lineWidth(1.6).strokeColor(colours.longWave).dash(4, { space: 3 }).moveTo(lx, ly + 5).lineTo(lx + 16, ly + 5).stroke().undash().restore();
  text('Long-wave thinning onset', lx + 20, ly, { size: 7.5 });
  lx += 136;
  doc.save().circle(lx + 5, ly + 5, 3).fillColor(colours.point).fill().restore();
  text('Operating point', lx + 12, ly, { size: 7.5 });
}
