import type { ReactNode, Ref } from 'react';
import type { QuantityKind } from '../../../shared/units/quantity-kinds';
import { useUnitSystem } from '../../lib/unit-system';
import { cn } from '../../utils/cn';
import { Field, Input } from '../ui/field';
import { describeParsedQuantity } from './parsed-quantity';

interface QuantityFieldProps {
  label: string;
  /** Kinds the text may be read as, first preferred. */
  kinds: readonly QuantityKind[];
  value: string;
  error?: string;
  hint?: ReactNode;
  placeholder?: string;
  readOnly?: boolean;
  className?: string;
  inputRef?: Ref<HTMLInputElement>;
  name?: string;
  onChange: (text: string) => void;
  onBlur?: () => void;
}

/**
 * A value typed with its unit ("12 cP", "35 dyn/cm", "68 °F"); beside it, live, the SI value
 * the server will store, or why the text cannot be read. The server parses again and decides.
 */
export function QuantityField({ label, kinds, value, error, hint, placeholder, readOnly, className, inputRef, name, onChange, onBlur }: QuantityFieldProps) {
  const [system] = useUnitSystem();
  const parsed = describeParsedQuantity(value ?? '', kinds, system);
  return (
    <Field label={label} error={error} hint={hint} className={className}>
      {({ id, describedBy, invalid }) => (
        <div className="flex flex-col gap-0.5">
          <Input
            id={id}
            ref={inputRef}
            name={name}
            value={value ?? ''}
            placeholder={placeholder}
            readOnly={readOnly}
            aria-invalid={invalid}
            aria-describedby={[describedBy, `${id}-si`].filter(Boolean).join(' ')}
            autoComplete="off"
            spellCheck={false}
            onChange={(event) => onChange(event.target.value)}
            onBlur={onBlur}
            className={cn(readOnly && 'bg-paper-sunk')}
          />
          <p
            id={`${id}-si`}
            data-testid="parsed-si"
            aria-live="polite"
            className={cn('min-h-5 text-xs', parsed.ok === false ? 'text-close-dark' : 'text-ink-soft')}
          >
            {parsed.ok === false ? `Not read yet: ${parsed.text}` : parsed.text}
          </p>
        </div>
      )}
    </Field>
  );
}
