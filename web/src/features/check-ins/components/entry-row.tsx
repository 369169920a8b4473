import { useState, type ReactNode } from 'react';
import { Button } from '@/components/ui/button';
import { ChevronRightIcon, PlusIcon, TrashIcon } from '@/components/ui/icons';
import { isApiError } from '@/lib/api-client';
import { cn } from '@/lib/cn';

interface EntryRowProps {
  /** Clock time of the entry. */
  time: string;
  children: ReactNode;
  /** Words that name the entry ("500 mL water at 07:30"): the row's accessible name is "Edit …". */
  describe: string;
  canEdit: boolean;
  onEdit?: () => void;
  /** Extra content at the row's start (a tick). */
  lead?: ReactNode;
}

/**
 * One logged entry with its time. For the athlete the whole row is one large button that opens
 * the entry for editing (Delete sits inside the edit form), so the figures keep the full width.
 */
export function EntryRow({ time, children, describe, canEdit, onEdit, lead }: EntryRowProps) {
  const body = (
    <>
      {lead}
      <span className="w-12 shrink-0 pt-0.5 text-sm font-semibold text-ink-muted tabular-nums">{time}</span>
      <span className="block min-w-0 flex-1 text-sm text-ink">{children}</span>
    </>
  );
  return (
    <li>
      {canEdit && onEdit ? (
        <button
          type="button"
          onClick={onEdit}
          aria-label={`Edit ${describe}`}
          className="-mx-2 flex min-h-touch w-[calc(100%+1rem)] items-start gap-3 rounded-md px-2 py-2.5 text-left hover:bg-paper"
        >
          {body}
          <ChevronRightIcon aria-hidden="true" className="mt-0.5 shrink-0 text-lg text-ink-faint" />
        </button>
      ) : (
        <div className="flex items-start gap-3 py-2.5">{body}</div>
      )}
    </li>
  );
}

/** A list of entries separated by hairlines. */
/** The "add another" part of a card: a wide button that opens the card's form in place. */
export function AddEntry({
  label,
  open,
  onOpen,
  divided,
  children,
}: {
  label: string;
  open: boolean;
  onOpen: () => void;
  /** Draw a rule above the open form (when entries are listed above it). */
  divided: boolean;
  children: ReactNode;
}) {
  if (open) return <div className={divided ? 'mt-4 border-t border-line pt-4' : undefined}>{children}</div>;
  return (
    <Button variant="secondary" size="lg" className="mt-4 w-full" icon={<PlusIcon />} onClick={onOpen}>
      {label}
    </Button>
  );
}

interface EditableEntriesProps<T extends { id: string; time: string }> {
  /** Accessible name of the list ("Meals logged"). */
  label: string;
  entries: readonly T[];
  canEdit: boolean;
  /** How the row's edit button names the entry ("250 mL water at 07:30"). */
  describe: (entry: T) => string;
  /** The row's content. */
  children: (entry: T) => ReactNode;
  /** The edit form that replaces the row; `done` closes it. */
  form: (entry: T, done: () => void) => ReactNode;
  /** Something shown before the time (a tick). */
  lead?: (entry: T) => ReactNode;
  formClassName?: string;
}

/** A card's logged entries, one of which at a time opens in place as its edit form. */
export function EditableEntries<T extends { id: string; time: string }>({
  label,
  entries,
  canEdit,
  describe,
  children,
  form,
  lead,
  formClassName = 'my-2 rounded-md bg-paper p-3',
}: EditableEntriesProps<T>) {
  const [editingId, setEditingId] = useState<string | null>(null);
  return (
    <EntryList label={label}>
      {entries.map((entry) =>
        editingId === entry.id ? (
          <li key={entry.id} className={formClassName}>
            {form(entry, () => setEditingId(null))}
          </li>
        ) : (
          <EntryRow
            key={entry.id}
            time={entry.time}
            describe={describe(entry)}
            canEdit={canEdit}
            onEdit={() => setEditingId(entry.id)}
            lead={lead?.(entry)}
          >
            {children(entry)}
          </EntryRow>
        ),
      )}
    </EntryList>
  );
}

export function EntryList({ label, children }: { label: string; children: ReactNode }) {
  return (
    <ul aria-label={label} className="divide-y divide-line">
      {children}
    </ul>
  );
}

/**
 * Delete, asked once more in place so a stray tap does not lose an entry. `what` names it in the
 * question ("Delete this drink?").
 */
export function ConfirmDelete({
  what,
  onDelete,
  className,
}: {
  what: string;
  onDelete: () => Promise<unknown>;
  className?: string;
}) {
  const [confirming, setConfirming] = useState(false);
  const [deleting, setDeleting] = useState(false);
  const [error, setError] = useState<string | null>(null);

  async function remove() {
    setDeleting(true);
    setError(null);
    try {
      await onDelete();
    } catch (e) {
      setError(isApiError(e) ? e.message : 'That could not be deleted. Try again.');
      setDeleting(false);
      setConfirming(false);
    }
  }

  return (
    <div className={cn(confirming && 'w-full', className)}>
      {confirming ? (
        <div className="flex flex-wrap items-center gap-2 rounded-md bg-off-plan-soft px-3 py-2">
          <p className="flex-1 text-sm font-medium text-ink">Delete {what}?</p>
          <Button variant="danger" loading={deleting} onClick={() => void remove()}>
            Delete
          </Button>
          <Button variant="ghost" disabled={deleting} onClick={() => setConfirming(false)}>
            Keep
          </Button>
        </div>
      ) : (
        <Button
          variant="ghost"
          className="text-off-plan hover:bg-off-plan-soft hover:text-off-plan"
          icon={<TrashIcon />}
          onClick={() => setConfirming(true)}
        >
          Delete
        </Button>
      )}
      {error ? (
        <p role="alert" className="mt-1 text-sm font-medium text-off-plan">
          {error}
        </p>
      ) : null}
    </div>
  );
}
