import type { CaughtMessage } from '@shared/schemas/admin';

/** The messages the local fake SMTP server caught, newest first; the text body shown as sent. */
export function CaughtMailList({ messages }: { messages: CaughtMessage[] }) {
  if (messages.length === 0) return <p className="text-ink-soft">No mail caught yet. Invitations and password resets show up here.</p>;
  return (
    <ul className="space-y-3">
      {messages.map((m) => (
        <li key={m.id}>
          <details className="rounded-xl bg-white p-4 shadow-sm ring-1 ring-cellar-100">
            <summary className="flex min-h-touch cursor-pointer flex-col justify-center">
              <span className="font-semibold text-cellar-900">{m.subject || '(no subject)'}</span>
              <span className="break-all text-sm text-ink-soft">
                to {m.to.join(', ')} · <time dateTime={m.receivedAt}>{new Date(m.receivedAt).toLocaleString()}</time>
              </span>
            </summary>
            <pre className="mt-3 whitespace-pre-wrap break-words border-t border-cellar-100 pt-3 font-sans text-sm text-ink">{m.text}</pre>
          </details>
        </li>
      ))}
    </ul>
  );
}
