import type { MarginStatus } from '../../../../shared/schemas/layer-checks';

/** The word, mark and colour classes of each margin status: a word and a shape beside every colour. */
export const marginStatusStyle: Readonly<Record<MarginStatus, { word: string; mark: string; text: string; tint: string; stroke: string }>> = Object.freeze({
  quiet: { word: 'Quiet', mark: '●', text: 'text-quiet-dark', tint: 'bg-quiet-light border-quiet/50', stroke: '#0f766e' },
  close: { word: 'Close', mark: '◆', text: 'text-close-dark', tint: 'bg-close-light border-close/50', stroke: '#b45309' },
  over: { word: 'Over', mark: '■', text: 'text-over-dark', tint: 'bg-over-light border-over/50', stroke: '#b3123c' },
});
