import { useRef, type KeyboardEvent } from 'react';

interface SegmentedControlProps<T extends string> {
  /** Read out as the group's name: "Read with", "Whose recipes". */
  label: string;
  value: T;
  options: readonly (readonly [T, string])[];
  onChange: (value: T) => void;
  /**
   * `pill`: a compact strip of segments (filters, unit switches); `fill` stretches it to its row.
   * `tiles`: one large tile per option across the row (a choice that changes the form below it).
   */
  look?: 'pill' | 'tiles';
  fill?: boolean;
}

const nextKeys: Record<string, 1 | -1> = { ArrowRight: 1, ArrowDown: 1, ArrowLeft: -1, ArrowUp: -1 };

/**
 * One of a few options, every one in view: a radio group of buttons (each a 44 px target). A tap,
 * Enter or Space chooses; the arrow keys move to the next option and choose it, as in any radio group.
 */
export function SegmentedControl<T extends string>({ label, value, options, onChange, look = 'pill', fill = false }: SegmentedControlProps<T>) {
  const buttons = useRef<(HTMLButtonElement | null)[]>([]);

  function onKeyDown(event: KeyboardEvent<HTMLButtonElement>, index: number) {
    const step = nextKeys[event.key];
    if (!step) return;
    event.preventDefault();
    const next = (index + step + options.length) % options.length;
    buttons.current[next]?.focus();
    onChange(options[next][0]);
  }

  const group =
    look === 'tiles' ? 'grid auto-cols-fr grid-flow-col gap-2' : `${fill ? 'flex' : 'inline-flex'} rounded-lg bg-white p-0.5 ring-1 ring-cellar-300`;
  return (
    <div role="radiogroup" aria-label={label} className={group}>
      {options.map(([option, text], index) => {
        const active = option === value;
        const segment =
          look === 'tiles'
            ? `min-h-touch rounded-lg px-2 py-2 text-sm font-semibold ring-1 ${active ? 'bg-cellar-700 text-white ring-cellar-700' : 'bg-white text-cellar-700 ring-cellar-300'}`
            : `min-h-touch min-w-touch rounded-md px-3 text-sm font-semibold ${fill ? 'flex-1 whitespace-nowrap' : ''} ${active ? 'bg-cellar-700 text-white' : 'text-cellar-700 hover:bg-cellar-50'}`;
        return (
          <button
            key={option}
            ref={(element) => {
              buttons.current[index] = element;
            }}
            type="button"
            role="radio"
            aria-checked={active}
            onClick={() => onChange(option)}
            onKeyDown={(event) => onKeyDown(event, index)}
            className={segment}
          >
            {text}
          </button>
        );
      })}
    </div>
  );
}
