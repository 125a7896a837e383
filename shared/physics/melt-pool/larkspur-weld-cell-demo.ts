/**
 * Invented demo data for the Larkspur Coatings weld cell: two heats with mill-test sulfur and
 * oxygen, and one melt-pool check joining them. Every company, heat number, supplier and reading
 * here is made up for demonstration. The liquid-steel property values are typical figures
 * recalled without a primary source (from memory — verify against DebRoy & David 1995,
 * Rev. Mod. Phys. 67:85) and the peak temperature sits inside the 2000–2800 K range reported for
 * GTA pools on 304 plate (Kraus 1987, Welding Journal Research Suppl., Dec.).
 */
export const LARKSPUR_WELD_CELL_DEMO = Object.freeze({
  company: 'Larkspur Coatings',
  cell: 'Weld Cell 1 — orbital tube welding (demo)',
  heats: Object.freeze([
    Object.freeze({
      heatNumber: 'LK-H24-0173',
      product: '316L tube, 12.7 mm OD × 1.65 mm wall (demo)',
      supplier: 'Fernhollow Tube Mill (invented)',
      sulfurWtPercent: 0.002,
      oxygenWtPercent: 0.003,
    }),
    Object.freeze({
      heatNumber: 'LK-H24-0391',
      product: '316L elbow fitting, 12.7 mm (demo)',
      supplier: 'Quarrystone Fittings (invented)',
      sulfurWtPercent: 0.012,
      oxygenWtPercent: 0.0045,
    }),
  ]),
  check: Object.freeze({
    title: 'Tube-to-elbow butt weld, LK-H24-0173 to LK-H24-0391 (demo)',
    edgeTemperature: 1809,
    peakTemperature: 2400,
    halfWidth: 2.5e-3,
    density: 6900,
    viscosity: 6e-3,
    thermalDiffusivity: 5e-6,
  }),
});
