import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/notice';
import { isApiError } from '../../../lib/api-client';
import { formatSignificant } from '../../../../shared/units/format-significant';
import { useCreateHeat, useDeleteHeat, useHeats } from '../api/melt-pool-api';

/** The heats (lots) register: mill-test sulfur and oxygen per heat number. Engineers add and remove. */
export function HeatsRegister({ canEdit }: { canEdit: boolean }) {
  const heats = useHeats();
  const create = useCreateHeat();
  const remove = useDeleteHeat();
  const [form, setForm] = useState({ heatNumber: '', supplier: '', product: '', sulfur: '', oxygen: '' });
  const fields = isApiError(create.error) ? (create.error.fields ?? {}) : {};

  const submit = (event: FormEvent) => {
    event.preventDefault();
    create.mutate({ ...form, oxygen: form.oxygen.trim() || null }, { onSuccess: () => setForm({ heatNumber: '', supplier: '', product: '', sulfur: '', oxygen: '' }) });
  };

  return (
    <section aria-labelledby="heats-title" className="flex flex-col gap-3">
      <h2 id="heats-title" className="text-xl font-semibold">Heats register</h2>
      <div className="overflow-x-auto rounded-md border border-slate-line bg-paper-raised">
        <table className="w-full text-sm">
          <thead className="bg-paper-sunk text-left text-ink-soft">
            <tr>
              <th className="px-3 py-2 font-medium">Heat</th>
              <th className="px-3 py-2 font-medium">Product</th>
              <th className="px-3 py-2 font-medium">Supplier</th>
              <th className="px-3 py-2 text-right font-medium">Sulfur</th>
              <th className="px-3 py-2 text-right font-medium">Oxygen</th>
              {canEdit && <th className="px-3 py-2"><span className="sr-only">Actions</span></th>}
            </tr>
          </thead>
          <tbody>
            {(heats.data?.items ?? []).map((h) => (
              <tr key={h.id} className="border-t border-slate-line">
                <td className="px-3 py-2 font-medium">{h.heatNumber}</td>
                <td className="px-3 py-2">{h.product || '—'}</td>
                <td className="px-3 py-2">{h.supplier || '—'}</td>
                <td className="px-3 py-2 text-right">{formatSignificant(h.sulfurPpm, 3)} ppm</td>
                <td className="px-3 py-2 text-right">{h.oxygenWtPercent === null ? '—' : `${formatSignificant(h.oxygenWtPercent * 1e4, 3)} ppm`}</td>
                {canEdit && (
                  <td className="px-3 py-2 text-right">
                    <Button variant="quiet" size="sm" onClick={() => remove.mutate(h.id)} aria-label={`Remove heat ${h.heatNumber}`}>
                      Remove
                    </Button>
                  </td>
                )}
              </tr>
            ))}
            {heats.data && heats.data.items.length === 0 && (
              <tr>
                <td colSpan={6} className="px-3 py-4 text-center text-ink-soft">No heats yet{canEdit ? ': add one from its mill-test report below.' : '.'}</td>
              </tr>
            )}
          </tbody>
        </table>
      </div>
      {remove.isError && <Notice tone="error" title="Could not remove the heat">{remove.error.message}</Notice>}
      {canEdit && (
        <form onSubmit={submit} aria-label="Add a heat" className="grid gap-3 rounded-md border border-slate-line bg-paper-raised p-4 sm:grid-cols-3 lg:grid-cols-6 lg:items-start">
          <TextField label="Heat number" value={form.heatNumber} error={fields.heatNumber} onChange={(e) => setForm({ ...form, heatNumber: e.target.value })} />
          <TextField label="Product" value={form.product} error={fields.product} onChange={(e) => setForm({ ...form, product: e.target.value })} />
          <TextField label="Supplier" value={form.supplier} error={fields.supplier} onChange={(e) => setForm({ ...form, supplier: e.target.value })} />
          <TextField label="Sulfur" placeholder="0.012 wt %" value={form.sulfur} error={fields.sulfur} onChange={(e) => setForm({ ...form, sulfur: e.target.value })} />
          <TextField label="Oxygen" placeholder="45 ppm" value={form.oxygen} error={fields.oxygen} onChange={(e) => setForm({ ...form, oxygen: e.target.value })} />
          <div className="flex items-end lg:pt-7">
            <Button type="submit" busy={create.isPending}>Add heat</Button>
          </div>
        </form>
      )}
    </section>
  );
}
