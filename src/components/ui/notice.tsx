import { CircleAlert, CircleCheck, Info, TriangleAlert } from 'lucide-react';
import type { ReactNode } from 'react';

type Tone = 'info' | 'caution' | 'error' | 'success';

const tones: Record<Tone, { box: string; Icon: typeof Info }> = {
  info: { box: 'bg-cellar-50 text-cellar-900 ring-cellar-100', Icon: Info },
  caution: { box: 'bg-malt-50 text-malt-700 ring-malt-100', Icon: TriangleAlert },
  error: { box: 'bg-alert-50 text-alert-700 ring-alert-500/30', Icon: CircleAlert },
  success: { box: 'bg-ok-50 text-ok-700 ring-ok-500/30', Icon: CircleCheck },
};

/** A short message in a tinted box: errors, cautions (hot wort, bottles) and confirmations. */
export function Notice({ tone = 'info', title, children, className = '' }: { tone?: Tone; title?: ReactNode; children?: ReactNode; className?: string }) {
  const { box, Icon } = tones[tone];
  return (
    <div role={tone === 'error' ? 'alert' : 'status'} className={`flex gap-3 rounded-lg p-3 ring-1 ${box} ${className}`}>
      <Icon aria-hidden className="mt-0.5 size-5 shrink-0" />
      <div className="min-w-0 text-sm">
        {title && <p className="font-semibold">{title}</p>}
        {children}
      </div>
    </div>
  );
}
