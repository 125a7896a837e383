import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect } from 'react';
import { useForm } from 'react-hook-form';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { auditFilterFormSchema, type AuditFilterForm } from './audit-filter-schema';

interface AuditFiltersProps {
  value: AuditFilterForm;
  onApply: (filters: AuditFilterForm) => void;
  /** Entity types seen so far, offered as suggestions. */
  entityTypes: string[];
  /** Field messages from the server (a 400 on the list query). */
  serverFieldErrors?: Record<string, string>;
}

export function AuditFilters({ value, onApply, entityTypes, serverFieldErrors }: AuditFiltersProps) {
  const {
    register,
    handleSubmit,
    reset,
    setError,
    formState: { errors },
  } = useForm<AuditFilterForm>({ resolver: zodResolver(auditFilterFormSchema), defaultValues: value });

  useEffect(() => reset(value), [value, reset]);
  useEffect(() => {
    for (const field of ['actor', 'entityType', 'from', 'to'] as const) {
      const message = serverFieldErrors?.[field];
      if (message) setError(field, { type: 'server', message });
    }
  }, [serverFieldErrors, setError]);

  const empty: AuditFilterForm = { actor: '', entityType: '', from: '', to: '' };
  const hasFilter = Object.values(value).some(Boolean);

  return (
    <form
      noValidate
      role="search"
      aria-label="Filter the audit trail"
      onSubmit={handleSubmit(onApply)}
      className="no-print mb-4 grid gap-3 rounded-md border border-slate-line bg-paper-raised p-4 sm:grid-cols-2 lg:grid-cols-[1.4fr_1fr_auto_auto_auto]"
    >
      <TextField label="Actor e-mail contains" type="search" error={errors.actor?.message} {...register('actor')} />
      <TextField label="Entity type" list="audit-entity-types" error={errors.entityType?.message} {...register('entityType')} />
      <datalist id="audit-entity-types">
        {entityTypes.map((type) => (
          <option key={type} value={type} />
        ))}
      </datalist>
      <TextField label="From (date)" type="date" error={errors.from?.message} {...register('from')} />
      <TextField label="To (date)" type="date" error={errors.to?.message} {...register('to')} />
      <div className="flex items-end gap-2 sm:col-span-2 lg:col-span-1">
        <Button type="submit">Apply</Button>
        {hasFilter && (
          <Button variant="quiet" onClick={() => onApply(empty)}>
            Clear
          </Button>
        )}
      </div>
    </form>
  );
}
