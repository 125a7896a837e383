import type { PublicConfig } from '../../../../shared/schemas/auth';
import { roleLabels } from '../../../../shared/schemas/roles';

interface DemoSignInsProps {
  signIns: PublicConfig['demoSignIns'];
  onPick: (email: string, password: string) => void;
}

/** Demo mode only: the invented Larkspur Coatings accounts, one per role, each fills the form. */
export function DemoSignIns({ signIns, onPick }: DemoSignInsProps) {
  if (signIns.length === 0) return null;
  return (
    <section aria-labelledby="demo-title" className="rounded-lg border border-brand/30 bg-brand-light/40 p-5">
      <h2 id="demo-title" className="font-semibold text-ink">
        Demo sign-ins
      </h2>
      <p className="mt-1 text-sm text-ink-soft">
        This QuietLayer runs in demo mode with the invented company Larkspur Coatings. Pick a role to fill the form, then press Sign in.
      </p>
      <ul className="mt-4 flex flex-col gap-2">
        {signIns.map((entry) => (
          <li key={entry.email}>
            <button
              type="button"
              onClick={() => onPick(entry.email, entry.password)}
              className="flex w-full flex-col items-start rounded-md border border-slate-line bg-paper-raised px-4 py-2.5 text-left hover:border-brand"
              data-testid={`demo-sign-in-${entry.role}`}
            >
              <span className="font-semibold text-ink">{roleLabels[entry.role]}</span>
              <span className="text-sm break-all text-ink-soft">
                {entry.email} · password <code className="rounded bg-paper-sunk px-1 text-ink">{entry.password}</code>
              </span>
            </button>
          </li>
        ))}
      </ul>
    </section>
  );
}
