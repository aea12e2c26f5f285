'use client';
/** The signed-in person's own API tokens: create (shown once), list, revoke. */
import { useState } from 'react';
import { toast } from 'sonner';
import type { TokenRow } from '@/db/queries/tokens';
import { api, errorMessage } from './client/api';

export function ApiTokens({ initial }: { initial: TokenRow[] }) {
  const [rows, setRows] = useState(initial);
  const [name, setName] = useState('');
  const [shown, setShown] = useState<string | null>(null);
  const reload = async () => setRows((await api<{ tokens: TokenRow[] }>('/api/tokens')).tokens);
  return (
    <section className="card space-y-3 p-4" aria-label="Your API tokens">
      <h2 className="text-title">Your API tokens</h2>
      <p className="text-small text-ink-muted">For scripts: send <code className="font-mono">Authorization: Bearer &lt;token&gt;</code>. A token acts as you, with your roles; only its digest is kept, so copy it now.</p>
      <form className="flex flex-wrap items-end gap-2" onSubmit={async (e) => {
        e.preventDefault();
        try { const out = await api<{ token: string }>('/api/tokens', { body: { name } }); setShown(out.token); setName(''); await reload(); } catch (err) { toast.error(errorMessage(err)); }
      }}>
        <div><label className="field-label" htmlFor="token-name">Token name</label><input id="token-name" className="field-input" value={name} onChange={(e) => setName(e.target.value)} placeholder="nightly generation script" /></div>
        <button type="submit" className="btn-secondary">Create token</button>
      </form>
      {shown ? <p role="status" className="break-all rounded border border-brand bg-brand-soft p-2 font-mono text-small" data-testid="new-token">{shown}</p> : null}
      {rows.length > 0 ? (
        <table className="data-table" aria-label="API tokens">
          <thead><tr><th>Name</th><th>Created</th><th>Last used</th><th>State</th><th /></tr></thead>
          <tbody>{rows.map((t) => (
            <tr key={t.id}><td>{t.name}</td><td>{new Date(t.createdAt).toLocaleString()}</td><td>{t.lastUsedAt ? new Date(t.lastUsedAt).toLocaleString() : 'never'}</td><td>{t.revokedAt ? 'revoked' : 'active'}</td>
              <td>{t.revokedAt ? null : <button type="button" className="text-danger hover:underline" onClick={async () => { try { await api(`/api/tokens/${t.id}`, { method: 'DELETE' }); toast.success('Token revoked'); await reload(); } catch (err) { toast.error(errorMessage(err)); } }}>Revoke</button>}</td></tr>
          ))}</tbody>
        </table>
      ) : null}
    </section>
  );
}
