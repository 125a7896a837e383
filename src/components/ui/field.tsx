import { useId, type InputHTMLAttributes, type ReactNode, type SelectHTMLAttributes, type Ref } from 'react';
import { cn } from '../../utils/cn';

const controlClass =
  'block w-full min-h-11 rounded-md border bg-paper-raised px-3 text-ink placeholder:text-ink-faint ' +
  'disabled:bg-paper-sunk disabled:text-ink-soft aria-[invalid=true]:border-over aria-[invalid=true]:bg-over-light/30';

interface FieldProps {
  label: string;
  error?: string;
  hint?: ReactNode;
  className?: string;
  children: (ids: { id: string; describedBy: string | undefined; invalid: boolean }) => ReactNode;
}

/** A labelled control with its hint and its error directly beneath it (errors sit beside their field). */
export function Field({ label, error, hint, className, children }: FieldProps) {
  const id = useId();
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const describedBy = [hintId, errorId].filter(Boolean).join(' ') || undefined;
  return (
    <div className={cn('flex flex-col gap-1', className)}>
      <label htmlFor={id} className="text-sm font-semibold text-ink">
        {label}
      </label>
      {children({ id, describedBy, invalid: Boolean(error) })}
      {hint && (
        <p id={hintId} className="text-sm text-ink-soft">
          {hint}
        </p>
      )}
      {error && (
        <p id={errorId} className="flex items-start gap-1.5 text-sm font-medium text-over">
          <span aria-hidden="true">✕</span>
          {error}
        </p>
      )}
    </div>
  );
}

type InputProps = InputHTMLAttributes<HTMLInputElement> & { ref?: Ref<HTMLInputElement> };

export function Input({ className, ...rest }: InputProps) {
  return <input className={cn(controlClass, 'border-slate-line', className)} {...rest} />;
}

type SelectProps = SelectHTMLAttributes<HTMLSelectElement> & { ref?: Ref<HTMLSelectElement> };

export function Select({ className, children, ...rest }: SelectProps) {
  return (
    <select className={cn(controlClass, 'border-slate-line pr-8', className)} {...rest}>
      {children}
    </select>
  );
}

interface TextFieldProps extends InputProps {
  label: string;
  error?: string;
  hint?: ReactNode;
  fieldClassName?: string;
}

/** Input + label + hint + error in one, wired for screen readers. */
export function TextField({ label, error, hint, fieldClassName, ...input }: TextFieldProps) {
  return (
    <Field label={label} error={error} hint={hint} className={fieldClassName}>
      {({ id, describedBy, invalid }) => <Input id={id} aria-describedby={describedBy} aria-invalid={invalid} {...input} />}
    </Field>
  );
}
