/**
 * demo (the default for `npm start`) or production, read the same way server/env.ts reads it:
 * QUIETLAYER_MODE, else production when NODE_ENV=production, else demo.
 */
export function quietlayerMode(): 'demo' | 'production' {
  const mode = process.env.QUIETLAYER_MODE;
  if (mode === 'demo' || mode === 'production') return mode;
  if (mode) throw new Error(`QUIETLAYER_MODE must be demo or production, got "${mode}"`);
  return process.env.NODE_ENV === 'production' ? 'production' : 'demo';
}
