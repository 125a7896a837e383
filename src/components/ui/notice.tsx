import type { ReactNode } from 'react';
import { cn } from '../../utils/cn';

type Tone = 'info' | 'success' | 'error' | 'caution';

const tones: Record<Tone, { box: string; mark: string; word: string }> = {
  info: { box: 'border-brand/40 bg-brand-light/60', mark: 'ℹ', word: 'Note' },
  success: { box: 'border-quiet/50 bg-quiet-light/60', mark: '✓', word: 'Done' },
  error: { box: 'border-over/50 bg-over-light/60', mark: '!', word: 'Problem' },
  caution: { box: 'border-close/50 bg-close-light/60', mark: '▲', word: 'Caution' },
};

/** A boxed message. Errors are announced (role="alert"); the tone always has a word, not colour alone. */
export function Notice({ tone = 'info', title, children, className }: { tone?: Tone; title?: string; children?: ReactNode; className?: string }) {
  const style = tones[tone];
  return (
    <div role={tone === 'error' ? 'alert' : 'status'} className={cn('flex gap-3 rounded-md border px-4 py-3 text-ink', style.box, className)}>
      <span aria-hidden="true" className="mt-0.5 font-bold">
        {style.mark}
      </span>
      <div className="min-w-0">
        <p className="font-semibold">{title ?? style.word}</p>
        {children && <div className="text-[0.95rem] text-ink">{children}</div>}
      </div>
    </div>
  );
}
