import { useEffect, useId, useRef, useState } from 'react';
import { cn } from '../../utils/cn';

interface UserMenuProps {
  displayName: string;
  email: string;
  roleLabel: string;
  onSignOut: () => void;
  signingOut: boolean;
}

/** The signed-in person and the way out. Opens with click or keyboard; Escape closes and returns focus. */
export function UserMenu({ displayName, email, roleLabel, onSignOut, signingOut }: UserMenuProps) {
  const [open, setOpen] = useState(false);
  const menuId = useId();
  const wrapper = useRef<HTMLDivElement>(null);
  const toggle = useRef<HTMLButtonElement>(null);

  useEffect(() => {
    if (!open) return;
    const onPointer = (event: PointerEvent) => {
      if (!wrapper.current?.contains(event.target as Node)) setOpen(false);
    };
    const onKey = (event: KeyboardEvent) => {
      if (event.key === 'Escape') {
        setOpen(false);
        toggle.current?.focus();
      }
    };
    document.addEventListener('pointerdown', onPointer);
    document.addEventListener('keydown', onKey);
    return () => {
      document.removeEventListener('pointerdown', onPointer);
      document.removeEventListener('keydown', onKey);
    };
  }, [open]);

  return (
    <div ref={wrapper} className="relative">
      <button
        ref={toggle}
        type="button"
        aria-expanded={open}
        aria-controls={menuId}
        data-testid="user-menu-toggle"
        onClick={() => setOpen((value) => !value)}
        className="flex min-h-11 items-center gap-3 rounded-md border border-slate-line bg-paper-raised px-3 py-1 text-left hover:border-brand"
      >
        <span aria-hidden="true" className="flex size-8 items-center justify-center rounded-full bg-brand-light text-sm font-semibold text-brand-dark">
          {initials(displayName)}
        </span>
        <span className="hidden flex-col leading-tight sm:flex">
          <span className="text-sm font-semibold text-ink" data-testid="user-menu-name">{displayName}</span>
          <span className="text-xs text-ink-soft" data-testid="user-menu-role">{roleLabel}</span>
        </span>
        <span className="sr-only sm:hidden">{`${displayName}, ${roleLabel}`}</span>
        <span aria-hidden="true" className={cn('text-xs text-ink-soft transition-transform', open && 'rotate-180')}>
          ▾
        </span>
      </button>
      <div
        id={menuId}
        hidden={!open}
        className="absolute right-0 z-20 mt-2 w-72 rounded-md border border-slate-line bg-paper-raised p-4 shadow-lg"
      >
        <p className="font-semibold text-ink">{displayName}</p>
        <p className="text-sm break-all text-ink-soft">{email}</p>
        <p className="mt-2 inline-block rounded bg-brand-light px-2 py-0.5 text-sm font-medium text-brand-dark">{roleLabel}</p>
        <button
          type="button"
          onClick={onSignOut}
          disabled={signingOut}
          className="mt-4 flex min-h-11 w-full items-center justify-center rounded-md border border-slate-line font-medium text-ink hover:border-over hover:text-over disabled:opacity-60"
        >
          {signingOut ? 'Signing out…' : 'Sign out'}
        </button>
      </div>
    </div>
  );
}

function initials(name: string): string {
  const letters = name
    .split(/\s+/)
    .filter(Boolean)
    .slice(0, 2)
    .map((word) => word[0]?.toUpperCase() ?? '');
  return letters.join('') || '?';
}
