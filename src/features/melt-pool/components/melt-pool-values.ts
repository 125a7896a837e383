import type { MeltPoolInputBody } from '../../../../shared/schemas/melt-pool';

export interface MeltPoolFormValues {
  sulfur: string;
  edgeTemperature: string;
  peakTemperature: string;
  halfWidth: string;
  density: string;
  viscosity: string;
  thermalDiffusivity: string;
}

export const meltPoolFields: { key: keyof MeltPoolFormValues; label: string; hint?: string }[] = [
  { key: 'sulfur', label: 'Sulfur (surface-active solute)', hint: 'as on the mill-test report: "0.012 wt %" or "120 ppm"' },
  { key: 'edgeTemperature', label: 'Pool edge temperature', hint: 'the melting point, about 1809 K for iron' },
  { key: 'peakTemperature', label: 'Peak surface temperature' },
  { key: 'halfWidth', label: 'Pool half-width' },
  { key: 'density', label: 'Liquid density' },
  { key: 'viscosity', label: 'Liquid viscosity' },
  { key: 'thermalDiffusivity', label: 'Thermal diffusivity' },
];

/**
 * The Larkspur weld cell demo pool (INVENTED cell; liquid-steel values from memory — verify against
 * DebRoy & David 1995; shared/physics/melt-pool/larkspur-weld-cell-demo.ts), with the tube heat's sulfur.
 */
export function weldCellFormValues(): MeltPoolFormValues {
  return {
    sulfur: '20 ppm',
    edgeTemperature: '1809 K',
    peakTemperature: '2400 K',
    halfWidth: '2.5 mm',
    density: '6900 kg/m³',
    viscosity: '6 mPa·s',
    thermalDiffusivity: '5e-6 m²/s',
  };
}

export function valuesToMeltPoolInput(values: MeltPoolFormValues): MeltPoolInputBody {
  return { ...values };
}
