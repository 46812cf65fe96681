import type { AdminUser } from '@shared/schemas/admin';

export function UserTable({ users }: { users: AdminUser[] }) {
  if (users.length === 0) return <p className="text-ink-soft">No accounts match.</p>;
  return (
    <ul className="divide-y divide-cellar-100 rounded-xl bg-white shadow-sm ring-1 ring-cellar-100">
      {users.map((u) => (
        <li key={u.id} className="flex flex-wrap items-baseline gap-x-3 gap-y-1 px-4 py-3">
          <span className="min-w-0 flex-1">
            <span className="block truncate font-semibold text-ink">
              {u.displayName}
              {u.siteRole === 'admin' && <span className="ml-2 rounded bg-malt-100 px-1.5 py-0.5 text-xs font-semibold text-malt-700">site admin</span>}
            </span>
            <span className="block break-all text-sm text-ink-soft">{u.email}</span>
          </span>
          <span className="text-sm text-ink-faint">
            {u.clubCount} {u.clubCount === 1 ? 'club' : 'clubs'} · since {new Date(u.createdAt).toLocaleDateString()}
          </span>
        </li>
      ))}
    </ul>
  );
}
