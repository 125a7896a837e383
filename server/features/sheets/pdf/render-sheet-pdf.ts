import PDFDocument from 'pdfkit';
import { processKindLabels } from '../../../../shared/schemas/layer-checks';
import { sheetStateLabels, type SheetSnapshot, type SheetState } from '../../../../shared/schemas/sheets';
import { drawQuietWindowFigure } from './quiet-window-figure';
import { fontName, loadSheetFonts } from './sheet-fonts';
import { length, num, temperatureDifference, utc, withUnit } from './sheet-format';
import { FOOTER_SPACE, PAGE_MARGIN, SheetWriter } from './sheet-writer';

/** The closing line under the cautions of every Process sheet (DOMAIN.md §11). */
export const SHEET_CLOSING_LINE =
  'QuietLayer predicts flow behaviour; it is not a safety design tool. Follow NFPA 86 / EN 1539 (or your local code), ' +
  "your insurer's requirements and your authority having jurisdiction.";

export interface SheetPdfSignature {
  printedName: string;
  roleLabel: string;
  signedAt: string;
  meaningText: string;
}

export interface SheetPdfInput {
  number: string;
  revision: number;
  state: SheetState;
  title: string;
  line: string;
  purpose: string;
  authorName: string;
  /** When this revision was made (ISO); the PDF's creation date unless it is signed. */
  createdAt: string;
  snapshot: SheetSnapshot;
  signature: SheetPdfSignature | null;
  /** Returns of this and earlier revisions of the sheet, oldest first. */
  returns: { revision: number; reviewerName: string; comments: string; returnedAt: string }[];
  /** Base URL of this QuietLayer, without a trailing slash. */
  publicUrl: string;
}

const marginWords = { quiet: 'Quiet', close: 'Close', over: 'Over' } as const;
const marginColours = { quiet: '#0f766e', close: '#92400e', over: '#9f1239' } as const;

function heatingText(heating: Record<string, string>): string {
  switch (heating.mode) {
    case 'deltaT':
      return `Temperature difference across the layer ${heating.deltaT}${heating.heatTransferCoefficient ? `, top h = ${heating.heatTransferCoefficient}` : ''}`;
    case 'substrate-air':
      return `Substrate ${heating.substrateTemperature}, air ${heating.airTemperature}, top h = ${heating.heatTransferCoefficient}`;
    case 'heat-flux':
      return `Heat flux ${heating.heatFlux}${heating.heatTransferCoefficient ? `, top h = ${heating.heatTransferCoefficient}` : ''}`;
    case 'evaporation':
      return `Evaporation ${heating.evaporationRate}, latent heat ${heating.latentHeat}${heating.heatTransferCoefficient ? `, top h = ${heating.heatTransferCoefficient}` : ''}`;
    default:
      return Object.entries(heating)
        .map(([k, v]) => `${k} ${v}`)
        .join(', ');
  }
}

function topText(top: string, deformable: boolean): string {
  if (top === 'surface') return `free surface with surface tension${deformable ? ', may deform' : ', treated as flat'}`;
  if (top === 'rigid') return 'rigid lid';
  return 'flat stress-free top';
}

/**
 * Renders a Process sheet as PDF (A4), from its frozen snapshot only, so the same snapshot always
 * gives the same bytes: the document's creation date is the sheet's own time (signing time once
 * signed, else when the revision was made), never "now".
 *
 * Contents follow DOMAIN.md §10–11: header with company, site, line, number, revision and state;
 * process and purpose; property table with value, unit, source and uncertainty; operating point;
 * dimensionless groups; critical values; margin with its word; regime; wavelength and cell count;
 * the quiet-window figure in vector graphics; drying path and property spread when present;
 * cautions; review returns; signature block (21 CFR 11.50: printed name, date and time, meaning);
 * a footer with "page x of y" and how to verify the document on every page.
 */
export function renderSheetPdf(input: SheetPdfInput): Promise<Buffer> {
  const fonts = loadSheetFonts();
  const { snapshot } = input;
  const results = snapshot.results;
  const creationDate = new Date(input.signature?.signedAt ?? input.createdAt);
  const doc = new PDFDocument({
    size: 'A4',
    margins: { top: PAGE_MARGIN, left: PAGE_MARGIN, right: PAGE_MARGIN, bottom: FOOTER_SPACE },
    bufferPages: true,
    font: fonts.files.get(fontName('latin', 'regular')) as unknown as string,
    info: {
      Title: `Process sheet ${input.number} revision ${input.revision}: ${input.title}`,
      Author: input.authorName,
      Subject: `${snapshot.site.company}, ${input.line}`,
      Creator: 'QuietLayer',
      Producer: 'QuietLayer',
      CreationDate: creationDate,
      ModDate: creationDate,
    },
    lang: 'en',
    displayTitle: true,
  });
  for (const [name, font] of fonts.files) doc.registerFont(name, font as unknown as Buffer);

  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });

  const w = new SheetWriter(doc, fonts);
  const stateLabel = sheetStateLabels[input.state];

  // Header.
  const top = PAGE_MARGIN;
  doc.save().rect(w.left, top - 6, w.width, 74).fillColor('#eef6f5').fill().restore();
  w.text(snapshot.site.company, w.left + 10, top, { size: 16, bold: true, color: '#0f3d3a' });
  w.text(snapshot.site.name, w.left + 10, top + 22, { size: 9 });
  w.text(`Line: ${input.line}`, w.left + 10, top + 35, { size: 9 });
  w.text(`Process kind: ${processKindLabels[snapshot.check.processKind]}`, w.left + 10, top + 48, { size: 9 });
  const hx = w.left + w.width / 2 + 20;
  const hw = w.right - hx - 10;
  w.text('PROCESS SHEET', hx, top, { size: 8, bold: true, color: '#475569', width: hw, align: 'right' });
  w.text(input.number, hx, top + 10, { size: 15, bold: true, width: hw, align: 'right' });
  w.text(`Revision ${input.revision}`, hx, top + 30, { size: 10, width: hw, align: 'right' });
  w.text(`State: ${stateLabel}`, hx, top + 44, { size: 10, bold: true, width: hw, align: 'right', color: input.state === 'signed' ? '#0f766e' : '#92400e' });
  doc.y = top + 76;
  w.text(input.title, w.left, doc.y, { size: 13, bold: true, width: w.width });
  doc.y += 2;
  if (input.state !== 'signed' && input.state !== 'superseded') {
    w.paragraph(`This revision is ${stateLabel.toLowerCase()}: it is not signed and does not release the process.`, { size: 8.5, color: '#92400e', bold: true });
  }

  // Process and purpose.
  w.heading('Process and purpose');
  w.facts([
    ['Purpose', input.purpose],
    ['Layer check', `${snapshot.check.title}, revision ${snapshot.check.revision} (saved ${utc(snapshot.check.savedAt)}${snapshot.check.savedByName ? ` by ${snapshot.check.savedByName}` : ''})`],
    ...(snapshot.check.notes ? ([['Check notes', snapshot.check.notes]] as [string, string][]) : []),
    ['Fluid', `${snapshot.fluid.name} (${snapshot.fluid.kind}); properties stated at ${snapshot.fluid.referenceTemperature}${snapshot.fluid.validRange ? `, valid ${snapshot.fluid.validRange}` : ''}`],
    ['Prepared by', `${input.authorName}, Process engineer, ${utc(input.createdAt)}`],
    ...(input.revision > 1 ? ([['Revision', `${input.revision}; replaces revision ${input.revision - 1} of this sheet once signed`]] as [string, string][]) : []),
    ['Method', `Linear stability of the conduction state (Pearson 1958; Nield 1964), QuietLayer solver ${snapshot.solverVersion}`],
  ]);

  // Properties.
  w.heading('Fluid properties as entered');
  w.table(
    [
      { header: 'Property', width: 105 },
      { header: 'Value as entered', width: 100 },
      { header: 'In SI units', width: 92, align: 'right' },
      { header: 'Source', width: 138 },
      { header: 'Uncertainty', width: w.width - 435, align: 'right' },
    ],
    snapshot.fluid.properties.map((p) => [
      p.label,
      p.value,
      p.si === null ? '—' : `${num(p.si)} ${p.siUnit}`,
      p.source || 'not stated',
      p.uncertaintyPercent > 0 ? `± ${num(p.uncertaintyPercent, 3)} %` : 'not stated',
    ]),
  );

  const at = results.properties;
  w.paragraph(
    `At the evaluation temperature ${snapshot.input.temperature}: ρ = ${withUnit(at.density, 'kg/m³')}, μ = ${withUnit(at.viscosity * 1e3, 'mPa·s')}, ` +
      `σ = ${withUnit(at.surfaceTension * 1e3, 'mN/m')}, dσ/dT = ${withUnit(at.surfaceTensionSlope * 1e3, 'mN/(m·K)')}, k = ${withUnit(at.conductivity, 'W/(m·K)')}, ` +
      `κ = ${withUnit(at.thermalDiffusivity, 'm²/s')}, β = ${withUnit(at.expansion, '1/K')}.`,
    { size: 8.5, color: '#374151' },
  );

  // Operating point.
  const op = results.operatingPoint;
  w.heading('Operating point');
  w.facts([
    ['Layer depth', `${snapshot.input.depth} (= ${num(op.depth)} m)`],
    ['Liquid temperature', `${snapshot.input.temperature} (= ${num(op.temperature)} K)`],
    ['Heating', heatingText(snapshot.input.heating)],
    ['ΔT across the layer', `${temperatureDifference(op.deltaT)}${op.heatFlux !== null ? `; heat flux ${withUnit(op.heatFlux, 'W/m²')}` : ''}${op.heatTransferCoefficient !== null ? `; top h ${withUnit(op.heatTransferCoefficient, 'W/(m²·K)')}` : ''}`],
    ['Boundaries', `bottom ${snapshot.input.bottom.mechanics}, ${snapshot.input.bottom.thermal}; top ${topText(snapshot.input.top, snapshot.input.deformableSurface)}`],
    ...(snapshot.input.soluteFractionDifference !== null
      ? ([['Solvent fraction difference', num(snapshot.input.soluteFractionDifference, 3)]] as [string, string][])
      : []),
    ...(snapshot.input.lateral ? ([['Lateral difference', `${snapshot.input.lateral.deltaT} over ${snapshot.input.lateral.distance}`]] as [string, string][]) : []),
    ...(snapshot.input.panelWidth ? ([['Panel width', snapshot.input.panelWidth]] as [string, string][]) : []),
  ]);

  // Verdict.
  const word = marginWords[results.status];
  const marginText = results.margin === null ? 'no onset possible' : `${num(results.margin, 3)} ×`;
  const bx = w.left + 204;
  const sideWidth = w.right - bx;
  const statusLine = `${word}: margin ${results.status === 'quiet' ? `at or above the alert threshold ${num(results.alertThreshold, 3)}` : results.status === 'close' ? `between 1 and the alert threshold ${num(results.alertThreshold, 3)}` : 'below 1: cells are expected'}.`;
  const regimeLine = `Regime: ${results.regimeLabel}. At onset: ${results.mechanismLabel}.`;
  // Heading, margin box and the words beside it stay on one page (the mechanism sentence can run
  // to several lines; a break inside it would strand its last line on a page of its own).
  const sideHeight =
    w.height(statusLine, sideWidth, { size: 9 }) + w.height(regimeLine, sideWidth, { size: 9 }) + w.height(results.mechanismSentence, sideWidth, { size: 8.5 }) + 8;
  w.ensure(Math.max(50, sideHeight) + 44);
  w.heading('Onset margin and regime');
  const marginY = doc.y;
  doc.save().rect(w.left, marginY, 190, 46).fillColor('#f8fafc').fill().lineWidth(1.2).strokeColor(marginColours[results.status]).rect(w.left, marginY, 190, 46).stroke().restore();
  w.text('Onset margin (≥ 1 means quiet)', w.left + 8, marginY + 4, { size: 7.5, color: '#374151' });
  w.text(`${marginText}  ${word}`, w.left + 8, marginY + 16, { size: 17, bold: true, color: marginColours[results.status] });
  w.text(statusLine, bx, marginY + 2, { size: 9, width: sideWidth });
  w.text(regimeLine, bx, doc.y + 2, { size: 9, width: sideWidth });
  w.text(results.mechanismSentence, bx, doc.y + 2, { size: 8.5, width: sideWidth, color: '#374151' });
  doc.y = Math.max(doc.y, marginY + 50) + 4;

  const g = results.groups;
  const c = results.critical;
  w.table(
    [
      { header: 'Dimensionless group', width: 170 },
      { header: 'Value', width: 80, align: 'right' },
      { header: 'Critical value / result', width: 165 },
      { header: 'Value', width: w.width - 415, align: 'right' },
    ],
    [
      ['Rayleigh Ra = gβΔT d³/(νκ)', num(g.rayleigh), 'Ra at onset along this heating', num(c.rayleigh)],
      ['Marangoni Ma = (−dσ/dT)ΔT d/(μκ)', num(g.marangoni), 'Ma at onset along this heating', num(c.marangoni)],
      ['Biot Bi = h d/k', num(g.biot), 'Critical Ra, buoyancy alone', num(c.rayleighAlone)],
      ['Prandtl Pr = ν/κ', num(g.prandtl), 'Critical Ma, surface tension alone', num(c.marangoniAlone)],
      ['Bond Bo = ρg d²/σ', num(g.bond), 'Critical wavenumber k_c [1/d]', num(c.wavenumber)],
      ['Dynamic Bond Ra/Ma', num(g.dynamicBond), 'Cell wavelength 2πd/k_c', length(results.cells.wavelength)],
      ['Crispation Cr = μκ/(σd)', num(g.crispation), 'Hexagon spacing 4πd/(√3 k_c)', length(results.cells.hexagonSpacing)],
      ['Galileo Ga = g d³/(νκ)', num(g.galileo), 'Cells across the panel', results.cells.acrossPanel === null ? '—' : num(results.cells.acrossPanel, 3)],
      ['Capillary length √(σ/(ρg))', length(g.capillaryLength), 'Buoyancy share of the drive at onset', results.buoyancyShare === null ? '—' : `${num(results.buoyancyShare * 100, 3)} %`],
      ...(g.solutalMarangoni !== null ? [['Solutal Marangoni', num(g.solutalMarangoni), 'Solutal margin', num(results.solutal?.margin ?? null, 3)]] : []),
    ],
  );

  w.heading('Quiet window');
  const sizing = results.sizing;
  w.facts(
    [
      ['Largest quiet depth', sizing.maxStableDepth === null ? 'no limit at this heating' : length(sizing.maxStableDepth)],
      ['Smallest quiet depth', sizing.minStableDepth === null ? 'none (no long-wave thinning limit)' : `${length(sizing.minStableDepth)} (long-wave thinning below it)`],
      ['Largest quiet ΔT at this depth', sizing.maxDeltaT === null ? 'no limit' : temperatureDifference(sizing.maxDeltaT)],
    ],
    190,
  );
  w.ensure(250);
  const figureY = doc.y + 4;
  drawQuietWindowFigure(doc, snapshot.window, { x: w.left, y: figureY, width: w.width, height: 240 }, (text, x, y, style) => {
    w.text(text, x, y, { size: style.size, width: style.width, align: style.align, bold: style.bold, color: style.color, lineGap: 0 });
  });
  doc.y = figureY + 246;
  doc.x = w.left;

  if (results.defects.length > 0 || results.levers.length > 0) {
    w.heading('What to expect and what moves the margin');
    for (const d of results.defects) w.paragraph(`${d.name}: ${d.description}`, { size: 8.5 });
    for (const l of results.levers) w.paragraph(`• ${l.text}`, { size: 8.5 });
  }
  if (results.warnings.length > 0) {
    w.heading('Warnings');
    for (const warning of results.warnings) w.paragraph(`• ${warning.message}`, { size: 8.5 });
  }

  if (snapshot.dryingPath) {
    const dp = snapshot.dryingPath;
    w.heading(`Drying path: ${dp.title}`);
    w.paragraph(dp.verdictText, { size: 8.5 });
    w.paragraph(`Smallest margin along the path: thermal ${dp.minThermalMargin === null ? 'no onset' : num(dp.minThermalMargin, 3)}, solutal ${dp.minSolutalMargin === null ? 'no onset' : num(dp.minSolutalMargin, 3)}.`, { size: 8.5 });
    w.table(
      [
        { header: 'Zone', width: 90 },
        { header: 'Residence time', width: 75, align: 'right' },
        { header: 'Wet film out', width: 75, align: 'right' },
        { header: 'Solids out', width: 65, align: 'right' },
        { header: 'Hottest film', width: 70, align: 'right' },
        { header: 'Solvent', width: 60, align: 'right' },
        { header: 'Share of LFL', width: w.width - 435, align: 'right' },
      ],
      dp.zones.map((z) => [
        z.zone,
        withUnit(z.residenceTime, 's'),
        length(z.thicknessOut),
        `${num(z.solidsOut * 100, 3)} %`,
        `${num(z.maxFilmTemperature - 273.15, 3)} °C`,
        z.solventLitresPerMinute === null ? '—' : withUnit(z.solventLitresPerMinute, 'L/min'),
        z.lflFraction === null ? '—' : `${num(z.lflFraction * 100, 3)} %`,
      ]),
    );
  }

  if (snapshot.propertySpread) {
    const s = snapshot.propertySpread;
    w.heading('Property spread');
    w.facts([
      ['Samples', num(s.samples, 6)],
      ['Probability of onset', `${num(s.probabilityOfOnset * 100, 3)} %`],
      ['Margin 5th / 50th / 95th percentile', `${num(s.marginP05, 3)} / ${num(s.marginP50, 3)} / ${num(s.marginP95, 3)}`],
      ['Moves the margin most', s.drivers.map((d) => `${d.property} (swing ${num(d.swing, 3)})`).join('; ') || '—'],
    ], 190);
  }

  w.heading('Cautions');
  for (const caution of results.cautions) w.paragraph(`• ${caution}`, { size: 8.5 });
  w.paragraph('Local codes, your site procedures and qualified, licensed practice take precedence over anything on this sheet.', { size: 8.5 });
  w.paragraph(SHEET_CLOSING_LINE, { size: 8.5, bold: true });

  if (input.returns.length > 0) {
    w.heading('Review returns');
    for (const r of input.returns) w.paragraph(`Revision ${r.revision}, ${utc(r.returnedAt)}, ${r.reviewerName}: ${r.comments}`, { size: 8.5 });
  }

  // Signature block (heading and box stay together on one page). The box is as tall as its note
  // needs: the four rows, then the note, measured at its own size and width.
  const sig = input.signature;
  const signatureNote = sig
    ? 'Signed electronically in QuietLayer by the person named, after re-entering their password (21 CFR 11.50, 11.200). The SHA-256 of this PDF is kept with the signature record.'
    : 'Not signed. A QA reviewer signs in QuietLayer with their password and the meaning of the signature; the signed PDF is stored and cannot change.';
  const noteWidth = w.width - 16;
  const noteHeight = w.height(signatureNote, noteWidth, { size: 7.5 });
  const boxHeight = 84 + noteHeight + 8;
  w.ensure(boxHeight + 56);
  w.heading('Signature');
  const sy = doc.y;
  doc.save().lineWidth(0.8).strokeColor('#475569').rect(w.left, sy, w.width, boxHeight).stroke().restore();
  const rows: [string, string][] = [
    ['Printed name', sig?.printedName ?? ''],
    ['Role', sig?.roleLabel ?? ''],
    ['Date and time (UTC)', sig ? utc(sig.signedAt) : ''],
    ['Meaning of the signature', sig?.meaningText ?? ''],
  ];
  rows.forEach(([label, value], i) => {
    const y = sy + 8 + i * 19;
    w.text(label, w.left + 8, y, { size: 9, bold: true, width: 130 });
    if (value) w.text(value, w.left + 140, y, { size: 9, width: w.width - 150 });
    else doc.save().lineWidth(0.5).strokeColor('#64748b').moveTo(w.left + 140, y + 11).lineTo(w.right - 10, y + 11).stroke().restore();
  });
  w.text(signatureNote, w.left + 8, sy + 84, { size: 7.5, width: noteWidth, color: '#374151' });
  doc.y = sy + boxHeight + 6;

  // Footer on every page.
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i += 1) {
    doc.switchToPage(i);
    const bottomMargin = doc.page.margins.bottom;
    doc.page.margins.bottom = 0;
    const fy = doc.page.height - FOOTER_SPACE + 14;
    doc.save().lineWidth(0.5).strokeColor('#94a3b8').moveTo(w.left, fy - 4).lineTo(w.right, fy - 4).stroke().restore();
    w.text(`${input.number} revision ${input.revision} · ${stateLabel}`, w.left, fy, { size: 7.5, width: w.width / 2 });
    w.text(`page ${i - range.start + 1} of ${range.count}`, w.left + w.width / 2, fy, { size: 7.5, width: w.width / 2, align: 'right' });
    w.text(`Verify this document at ${input.publicUrl}/verify: upload the PDF; its SHA-256 must match the signed record.`, w.left, fy + 11, {
      size: 7.5,
      width: w.width,
      color: '#374151',
    });
    doc.page.margins.bottom = bottomMargin;
  }
  doc.end();
  return done;
}
