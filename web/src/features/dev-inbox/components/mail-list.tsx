import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { InboxIcon } from '@/components/ui/icons';
import { Skeleton } from '@/components/ui/spinner';
import { cn } from '@/lib/cn';
import { formatDateTime } from '@/lib/format';
import { useMailList } from '../api/get-mail-list';

interface MailListProps {
  selectedId: string | null;
  onSelect: (id: string) => void;
}

export function MailList({ selectedId, onSelect }: MailListProps) {
  const list = useMailList();

  if (list.isPending) {
    return (
      <div className="space-y-2" aria-busy="true" aria-label="Loading captured e-mails">
        {[0, 1, 2, 3].map((i) => (
          <Skeleton key={i} className="h-16" />
        ))}
      </div>
    );
  }
  if (list.isError) {
    const off = list.error.status === 404;
    return (
      <Alert
        tone={off ? 'info' : 'error'}
        title={off ? 'The inbox is off on this server.' : 'The captured e-mails could not be loaded.'}
        action={
          off ? null : (
            <Button size="sm" variant="secondary" onClick={() => void list.refetch()}>
              Try again
            </Button>
          )
        }
      >
        {off
          ? 'The inbox opens only in demo mode (npm start) and only in a browser on the same machine as the server.'
          : list.error.message}
      </Alert>
    );
  }
  if (list.data.length === 0) {
    return (
      <EmptyState icon={<InboxIcon />} title="Nothing captured yet" level={2}>
        Invite someone or ask for a password reset, and the e-mail shows up here within a few seconds.
      </EmptyState>
    );
  }
  return (
    <ul
      aria-label="Captured e-mails"
      className="divide-y divide-line overflow-hidden rounded-lg border border-line bg-surface"
    >
      {list.data.map((mail) => {
        const selected = mail.id === selectedId;
        return (
          <li key={mail.id}>
            <button
              type="button"
              onClick={() => onSelect(mail.id)}
              aria-current={selected ? 'true' : undefined}
              className={cn(
                'block min-h-touch w-full px-4 py-3 text-left hover:bg-paper',
                selected && 'bg-accent-soft hover:bg-accent-soft',
              )}
            >
              <span className="block truncate font-semibold text-ink">{mail.subject || '(no subject)'}</span>
              <span className="block truncate text-sm text-ink-muted">To {mail.to.join(', ')}</span>
              <span className="block text-xs text-ink-faint tabular-nums">
                {formatDateTime(mail.receivedAt)}
              </span>
            </button>
          </li>
        );
      })}
    </ul>
  );
}
