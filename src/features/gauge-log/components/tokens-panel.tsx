import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/notice';
import { formatDateTime } from '../../../utils/format';
import { useGaugeTokens } from '../api/gauge-queries';
import { useIssueToken, useRevokeToken } from '../api/gauge-mutations';

/** Engineers: issue a device token for this sheet's line (shown once), see and revoke tokens. */
export function TokensPanel({ revisionId }: { revisionId: string }) {
  const tokens = useGaugeTokens(revisionId, true);
  const issue = useIssueToken();
  const revoke = useRevokeToken();
  const [label, setLabel] = useState('');
  return (
    <section aria-labelledby="tokens-heading" className="flex flex-col gap-3">
      <h2 id="tokens-heading" className="text-lg font-semibold">
        Gauge tokens
      </h2>
      <p className="text-sm text-ink-soft">
        A gauge posts readings to <code>POST /api/gauge/readings</code> with <code>Authorization: Bearer &lt;token&gt;</code> and a batch id of its own; a repeated batch id is
        answered with the first result. A token works for this sheet and line only.
      </p>
      <form
        className="flex flex-wrap items-end gap-2"
        onSubmit={(e) => {
          e.preventDefault();
          issue.mutate({ revisionId, label }, { onSuccess: () => setLabel('') });
        }}
      >
        <TextField label="Label" value={label} placeholder="e.g. Line 2 inline gauge" onChange={(e) => setLabel(e.target.value)} error={issue.error?.message} />
        <Button type="submit" busy={issue.isPending}>
          Issue token
        </Button>
      </form>
      {issue.data && (
        <Notice tone="caution" title="Copy this token now: it is shown only once">
          <code className="break-all" data-testid="issued-token">
            {issue.data.token}
          </code>
        </Notice>
      )}
      {tokens.data && tokens.data.items.length > 0 && (
        <ul className="flex flex-col gap-1 text-sm">
          {tokens.data.items.map((t) => (
            <li key={t.id} className="flex flex-wrap items-center gap-2">
              <code>{t.tokenPrefix}…</code> {t.label} · {t.line} · issued by {t.createdByName} {formatDateTime(t.createdAt)} ·{' '}
              {t.revokedAt ? `revoked ${formatDateTime(t.revokedAt)}` : t.lastUsedAt ? `last used ${formatDateTime(t.lastUsedAt)}` : 'not used yet'}
              {!t.revokedAt && (
                <Button size="sm" variant="danger" busy={revoke.isPending && revoke.variables === t.id} onClick={() => revoke.mutate(t.id)}>
                  Revoke
                </Button>
              )}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
