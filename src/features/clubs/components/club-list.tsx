import { ChevronRight, Users } from 'lucide-react';
import { Link } from 'react-router';
import type { ClubSummary } from '@shared/schemas/clubs';
import { roleLabels } from './role-words';

export function ClubList({ clubs }: { clubs: ClubSummary[] }) {
  return (
    <ul className="space-y-2">
      {clubs.map((club) => (
        <li key={club.id}>
          <Link
            to={`/clubs/${club.id}`}
            className="flex min-h-touch items-center gap-3 rounded-xl bg-white p-4 shadow-sm ring-1 ring-cellar-100 hover:ring-cellar-300"
          >
            <Users aria-hidden className="size-6 shrink-0 text-cellar-500" />
            <span className="min-w-0 flex-1">
              <span className="block truncate text-lg font-semibold text-cellar-900">{club.name}</span>
              <span className="block text-sm text-ink-soft">
                {roleLabels[club.role]} · {club.memberCount} {club.memberCount === 1 ? 'member' : 'members'}
              </span>
            </span>
            <ChevronRight aria-hidden className="size-5 shrink-0 text-ink-faint" />
          </Link>
        </li>
      ))}
    </ul>
  );
}
