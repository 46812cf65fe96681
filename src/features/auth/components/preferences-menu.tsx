import { Check, CircleUser, LogOut } from 'lucide-react';
import { useEffect, useRef, useState } from 'react';
import type { ColourScalePreference, GallonUnit, GravityUnit, Me, UnitSystem } from '@shared/schemas/auth';
import { confirmSignOut, useLogout } from '../api/logout';
import { useUpdatePreferences } from '../api/update-preferences';

const unitOptions: { value: UnitSystem; label: string }[] = [
  { value: 'metric', label: 'Metric (L, kg, °C)' },
  { value: 'us', label: 'US (gal, lb, °F)' },
];
const colourOptions: { value: ColourScalePreference; label: string }[] = [
  { value: 'srm', label: 'SRM (US)' },
  { value: 'ebc', label: 'EBC (European)' },
];

const gallonOptions: { value: GallonUnit; label: string }[] = [
  { value: 'us', label: 'US gallons (3.785 L)' },
  { value: 'imperial', label: 'Imperial gallons (4.546 L)' },
];
const gravityOptions: { value: GravityUnit; label: string }[] = [
  { value: 'sg', label: 'Specific gravity (1.050)' },
  { value: 'plato', label: 'Degrees Plato (12.4 °P)' },
];

/** The account menu: who is signed in, unit preferences, sign out. */
export function PreferencesMenu({ me, onSignedOut }: { me: Me; onSignedOut: () => void }) {
  const [open, setOpen] = useState(false);
  const ref = useRef<HTMLDivElement>(null);
  const update = useUpdatePreferences();
  const logout = useLogout();
  const logoutEverywhere = useLogout({ everywhere: true });

  useEffect(() => {
    if (!open) return;
    const close = (e: MouseEvent | KeyboardEvent) => {
      if (e instanceof KeyboardEvent ? e.key === 'Escape' : !ref.current?.contains(e.target as Node)) setOpen(false);
    };
    document.addEventListener('mousedown', close);
    document.addEventListener('keydown', close);
    return () => {
      document.removeEventListener('mousedown', close);
      document.removeEventListener('keydown', close);
    };
  }, [open]);

  return (
    <div className="relative" ref={ref}>
      <button
        type="button"
        aria-haspopup="menu"
        aria-expanded={open}
        onClick={() => setOpen((o) => !o)}
        className="flex min-h-touch min-w-touch items-center gap-2 rounded-lg px-2 text-white hover:bg-cellar-900"
      >
        <CircleUser aria-hidden className="size-6" />
        <span className="hidden max-w-40 truncate sm:inline">{me.displayName}</span>
        <span className="sr-only">Account and units</span>
      </button>
      {open && (
        <div role="menu" className="absolute right-0 z-20 mt-2 w-72 max-w-[calc(100vw-1rem)] rounded-xl bg-white p-2 text-ink shadow-lg ring-1 ring-cellar-100">
          <p className="px-3 py-2 text-sm text-ink-soft">
            Signed in as <strong className="text-ink">{me.displayName}</strong>
            <br />
            {me.email}
          </p>
          <MenuGroup label="Volumes, weights, temperatures">
            {unitOptions.map((o) => (
              <MenuChoice key={o.value} checked={me.unitSystem === o.value} onSelect={() => update.mutate({ unitSystem: o.value })}>
                {o.label}
              </MenuChoice>
            ))}
          </MenuGroup>
          {me.unitSystem === 'us' && (
            <MenuGroup label="Gallons">
              {gallonOptions.map((o) => (
                <MenuChoice key={o.value} checked={me.gallonUnit === o.value} onSelect={() => update.mutate({ gallonUnit: o.value })}>
                  {o.label}
                </MenuChoice>
              ))}
            </MenuGroup>
          )}
          <MenuGroup label="Gravity">
            {gravityOptions.map((o) => (
              <MenuChoice key={o.value} checked={me.gravityUnit === o.value} onSelect={() => update.mutate({ gravityUnit: o.value })}>
                {o.label}
              </MenuChoice>
            ))}
          </MenuGroup>
          <MenuGroup label="Beer colour">
            {colourOptions.map((o) => (
              <MenuChoice key={o.value} checked={me.colourScale === o.value} onSelect={() => update.mutate({ colourScale: o.value })}>
                {o.label}
              </MenuChoice>
            ))}
          </MenuGroup>
          {update.isError && <p className="px-3 text-sm text-alert-700">Could not save: {update.error.message}</p>}
          <button
            type="button"
            role="menuitem"
            className="mt-1 flex min-h-touch w-full items-center gap-2 rounded-lg px-3 text-left hover:bg-cellar-50"
            onClick={() => void confirmSignOut(me.id).then((go) => go && logout.mutate(undefined, { onSuccess: onSignedOut }))}
          >
            <LogOut aria-hidden className="size-5" /> Sign out
          </button>
          <button
            type="button"
            role="menuitem"
            className="flex min-h-touch w-full items-center gap-2 rounded-lg px-3 text-left hover:bg-cellar-50"
            onClick={() => logoutEverywhere.mutate(undefined, { onSuccess: onSignedOut })}
          >
            <LogOut aria-hidden className="size-5" /> Sign out on every device
          </button>
        </div>
      )}
    </div>
  );
}

function MenuGroup({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <div role="group" aria-label={label} className="border-t border-cellar-100 py-1">
      <p className="px-3 pt-1 text-xs font-semibold uppercase tracking-wide text-ink-faint">{label}</p>
      {children}
    </div>
  );
}

function MenuChoice({ checked, onSelect, children }: { checked: boolean; onSelect: () => void; children: React.ReactNode }) {
  return (
    <button
      type="button"
      role="menuitemradio"
      aria-checked={checked}
      onClick={onSelect}
      className="flex min-h-touch w-full items-center justify-between rounded-lg px-3 text-left hover:bg-cellar-50"
    >
      {children}
      {checked && <Check aria-hidden className="size-5 text-cellar-500" />}
    </button>
  );
}
