import { Alert } from '@/components/ui/alert';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { EnvelopeIcon } from '@/components/ui/icons';
import { PageLoader } from '@/components/ui/spinner';
import { formatDateTime } from '@/lib/format';
import { useMail } from '../api/get-mail';
import { linkify, linksIn } from '../utils/linkify';

export function MailView({ id }: { id: string | null }) {
  const mail = useMail(id);

  if (id === null) {
    return (
      <EmptyState icon={<EnvelopeIcon />} title="Choose an e-mail" level={2}>
        Its text and the links inside open here.
      </EmptyState>
    );
  }
  if (mail.isPending) return <PageLoader label="Opening the e-mail…" />;
  if (mail.isError) {
    return (
      <Alert tone="error" title="This e-mail could not be opened.">
        {mail.error.message}
      </Alert>
    );
  }

  const message = mail.data;
  const links = linksIn(message.text);
  return (
    <Card as="article" aria-labelledby="mail-subject">
      <h2 id="mail-subject" className="text-xl font-bold text-ink">
        {message.subject || '(no subject)'}
      </h2>
      <dl className="mt-3 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="text-ink-faint">From</dt>
        <dd className="break-all text-ink">{message.from}</dd>
        <dt className="text-ink-faint">To</dt>
        <dd className="break-all text-ink">{message.to.join(', ')}</dd>
        <dt className="text-ink-faint">Received</dt>
        <dd className="text-ink tabular-nums">{formatDateTime(message.receivedAt)}</dd>
      </dl>
      {links.length > 0 ? (
        <section aria-labelledby="mail-links" className="mt-5 rounded-md bg-accent-soft px-4 py-3">
          <h3 id="mail-links" className="text-sm font-semibold text-ink">
            Links in this e-mail
          </h3>
          <ul className="mt-1 space-y-1">
            {links.map((href) => (
              <li key={href} className="text-sm break-all">
                <a href={href} className="font-semibold">
                  {href}
                </a>
              </li>
            ))}
          </ul>
        </section>
      ) : null}
      <div className="mt-5 border-t border-line pt-4 text-sm leading-relaxed whitespace-pre-wrap break-words text-ink">
        {linkify(message.text).map((part, i) =>
          part.kind === 'link' ? (
            <a key={i} href={part.href} className="break-all">
              {part.text}
            </a>
          ) : (
            <span key={i}>{part.text}</span>
          ),
        )}
      </div>
    </Card>
  );
}
