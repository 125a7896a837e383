import { cn } from '../../utils/cn';

export type StatusTone = 'quiet' | 'close' | 'over' | 'neutral';

const tones: Record<StatusTone, string> = {
  quiet: 'bg-quiet-light text-quiet-dark border-quiet/40',
  close: 'bg-close-light text-close-dark border-close/40',
  over: 'bg-over-light text-over-dark border-over/40',
  neutral: 'bg-paper-sunk text-ink-soft border-slate-line',
};

const marks: Record<StatusTone, string> = { quiet: '●', close: '◆', over: '■', neutral: '○' };

/** A status word with a colour and a shape: never colour alone. */
export function StatusBadge({ tone, children }: { tone: StatusTone; children: string }) {
  return (
    <span className={cn('inline-flex items-center gap-1.5 whitespace-nowrap rounded-full border px-2.5 py-0.5 text-sm font-semibold', tones[tone])}>
      <span aria-hidden="true" className="text-[0.7em]">
        {marks[tone]}
      </span>
      {children}
    </span>
  );
}
