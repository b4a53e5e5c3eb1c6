import { Loading } from '@/components/ui/load-states.tsx';
import { useSearchParams } from 'react-router-dom';
import { can } from '@shared/policies.ts';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { Button } from '@/components/ui/button.tsx';
import { useSession } from '@/features/session/api/get-session.ts';
import { toActor } from '@/features/session/to-actor.ts';
import { useAdminUsers } from '@/features/admin/api/list-users.ts';
import { UserRow } from '@/features/admin/components/user-row.tsx';
import { GivenUpMails } from '@/features/admin/components/given-up-mails.tsx';

export function AdminUsersPage() {
  const { data: session } = useSession();
  const [params, setParams] = useSearchParams();
  const q = params.get('q') ?? '';
  const page = Number(params.get('page') ?? '1') || 1;
  const allowed = can(toActor(session?.user ?? null), 'user.list');
  const users = useAdminUsers({ q: q || undefined, page });

  if (!allowed) {
    return (
      <div>
        <PageHeader title="Admin" />
        <p className="text-ink-soft">Only admins can manage accounts.</p>
      </div>
    );
  }
  const total = users.data?.total ?? 0;
  const pages = Math.max(1, Math.ceil(total / (users.data?.pageSize ?? 25)));
  return (
    <div>
      <PageHeader
        title="Accounts"
        lead="Grant or revoke the moderator role, suspend accounts and revoke rig tokens. A suspended person is signed out and cannot write. Each change is on the audit trail."
      />
      <form
        role="search"
        className="mb-4 flex gap-2"
        onSubmit={(e) => {
          e.preventDefault();
          const value = String(new FormData(e.currentTarget).get('q') ?? '');
          setParams(value ? { q: value } : {});
        }}
      >
        <label htmlFor="user-search" className="sr-only">
          Search by handle or name
        </label>
        <input
          id="user-search"
          name="q"
          defaultValue={q}
          placeholder="Handle or name"
          className="w-64 max-w-full rounded border border-rule bg-white px-2 py-1"
        />
        <Button type="submit" variant="secondary">
          Search
        </Button>
      </form>
      {users.isError && (
        <p role="alert" className="text-danger">
          {users.error.message}
        </p>
      )}
      <div className="overflow-x-auto rounded-lg border border-rule bg-white p-3">
        <table className="w-full min-w-[40rem] text-left">
          <thead className="text-xs uppercase tracking-wide text-ink-soft">
            <tr>
              <th className="pb-2">Account</th>
              <th className="pb-2">Role</th>
              <th className="pb-2">Joined</th>
              <th className="pb-2">Last sign-in</th>
              <th className="pb-2">State</th>
              <th className="pb-2" />
            </tr>
          </thead>
          <tbody>
            {users.data?.items.map((u) => (
              <UserRow key={u.id} user={u} isSelf={u.id === session?.user?.id} />
            ))}
          </tbody>
        </table>
        {users.isPending && <Loading>Loading the accounts…</Loading>}
      </div>
      <p className="mt-3 flex items-center gap-3 text-sm">
        <span className="num">{total} accounts</span>
        {page > 1 && (
          <Button variant="ghost" onClick={() => setParams({ ...(q ? { q } : {}), page: String(page - 1) })}>
            Previous
          </Button>
        )}
        {page < pages && (
          <Button variant="ghost" onClick={() => setParams({ ...(q ? { q } : {}), page: String(page + 1) })}>
            Next
          </Button>
        )}
      </p>
      <GivenUpMails />
    </div>
  );
}
