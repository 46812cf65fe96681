import type { ReactNode } from 'react';

const valueSizes = {
  sm: 'font-semibold',
  md: 'text-lg font-semibold',
  lg: 'text-lg font-bold',
  xl: 'text-xl font-bold',
  '2xl': 'text-2xl font-bold',
  '3xl': 'text-3xl font-bold',
} as const;

const valueTones = { plain: '', strong: 'text-cellar-900', alert: 'text-alert-700' } as const;

interface FigureProps {
  label: ReactNode;
  value: ReactNode;
  /** A line under the value: how many readings, where the number comes from. */
  hint?: ReactNode;
  size?: keyof typeof valueSizes;
  tone?: keyof typeof valueTones;
  /** `caps`: a small upper-case caption (figures at a glance); `plain`: the label as a short phrase. */
  labelStyle?: 'caps' | 'plain';
  /** Classes of the pair's box: a tinted tile, a card, `min-w-0` in a tight grid. */
  className?: string;
  /** For a test that reads the value. */
  valueTestId?: string;
  /** In a line of text: "Since pitching: **6 days**" (size and label style do not apply). */
  inline?: boolean;
}

/**
 * A labelled number: one term and its value (and an optional hint) in the surrounding `<dl>`, so
 * a screen reader reads the label with the value.
 */
export function Figure({ label, value, hint, size = 'md', tone = 'plain', labelStyle = 'caps', className, valueTestId, inline = false }: FigureProps) {
  if (inline) {
    return (
      <div className={className}>
        <dt className="inline">{label}: </dt>
        <dd className={`inline font-semibold tabular-nums ${tone === 'plain' ? 'text-ink' : valueTones[tone]}`} data-testid={valueTestId}>
          {value}
        </dd>
      </div>
    );
  }
  return (
    <div className={className}>
      <dt className={labelStyle === 'caps' ? 'text-xs font-semibold uppercase tracking-wide text-ink-faint' : 'text-sm text-ink-soft'}>{label}</dt>
      <dd className={`${valueSizes[size]} ${valueTones[tone]} tabular-nums`} data-testid={valueTestId}>
        {value}
      </dd>
      {hint && <dd className="text-xs text-ink-faint">{hint}</dd>}
    </div>
  );
}
