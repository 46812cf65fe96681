import { NavLink } from 'react-router';

const tabs = [
  { to: '/admin/users', label: 'Accounts' },
  { to: '/admin/mail', label: 'Caught mail' },
];

export function AdminTabs() {
  return (
    <nav aria-label="Admin" className="mb-4 flex gap-1 border-b border-cellar-100">
      {tabs.map((t) => (
        <NavLink
          key={t.to}
          to={t.to}
          className={({ isActive }) =>
            `flex min-h-touch items-center rounded-t-lg px-4 font-semibold ${isActive ? 'bg-white text-cellar-900 ring-1 ring-cellar-100' : 'text-cellar-700 hover:bg-cellar-50'}`
          }
        >
          {t.label}
        </NavLink>
      ))}
    </nav>
  );
}
