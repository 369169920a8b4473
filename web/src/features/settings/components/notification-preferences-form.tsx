import {
  ATHLETE_NOTIFICATION_KINDS,
  NOTIFICATION_KINDS,
  NOTIFICATION_LABELS,
  notificationPreferences,
  STAFF_NOTIFICATION_KINDS,
  type NotificationKind,
  type NotificationPreferences,
} from '@driftmark/shared';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Checkbox } from '@/components/ui/checkbox';
import { Form, SubmitButton } from '@/components/ui/form';
import { Select } from '@/components/ui/select';
import { Skeleton } from '@/components/ui/spinner';
import { useNotifications } from '../api/get-notifications';
import { useUpdateNotifications } from '../api/update-notifications';

/** Shown when an athlete has never chosen an hour (the API answers null). */
const FALLBACK_REMINDER_HOUR = 9;

/** 0–23 as clock times on the athlete's own clock: "00:00" … "23:00". */
const HOUR_OPTIONS = Array.from({ length: 24 }, (_, hour) => ({
  value: String(hour),
  label: `${String(hour).padStart(2, '0')}:00`,
}));

/** A select's string → the schema's hour (empty → null). */
function readHour(value: unknown): number | null {
  if (typeof value === 'number') return value;
  const text = String(value ?? '');
  return text === '' ? null : Number(text);
}

/** Every kind present (missing kinds count as wanted), so the full map goes back on save. */
function withAllKinds(prefs: NotificationPreferences, staff: boolean): NotificationPreferences {
  const enabled = {} as Record<NotificationKind, boolean>;
  for (const kind of NOTIFICATION_KINDS) enabled[kind] = prefs.enabled[kind] ?? true;
  return {
    enabled,
    reminderHour: staff ? prefs.reminderHour : (prefs.reminderHour ?? FALLBACK_REMINDER_HOUR),
  };
}

/**
 * Which e-mails the signed-in user gets: the staff kinds for coaches, the athlete kinds (and the
 * reminder hour on their own clock) for athletes.
 */
export function NotificationPreferencesForm({ staff, timeZone }: { staff: boolean; timeZone: string }) {
  const query = useNotifications();

  if (query.isPending) {
    return (
      <div aria-busy="true" aria-label="Loading your e-mail choices" className="space-y-3">
        <Skeleton className="h-12" />
        <Skeleton className="h-12" />
        <Skeleton className="h-12" />
      </div>
    );
  }
  if (query.isError) {
    return (
      <Alert
        tone="error"
        title="Your e-mail choices could not be loaded."
        action={
          <Button variant="secondary" size="sm" onClick={() => void query.refetch()}>
            Try again
          </Button>
        }
      >
        {query.error.message}
      </Alert>
    );
  }
  return <PreferencesEditor prefs={withAllKinds(query.data, staff)} staff={staff} timeZone={timeZone} />;
}

function PreferencesEditor({
  prefs,
  staff,
  timeZone,
}: {
  prefs: NotificationPreferences;
  staff: boolean;
  timeZone: string;
}) {
  const [saved, setSaved] = useState(false);
  const form = useForm<NotificationPreferences>({
    resolver: zodResolver(notificationPreferences),
    defaultValues: prefs,
  });
  const update = useUpdateNotifications({
    onSuccess: (next) => {
      setSaved(true);
      form.reset(withAllKinds(next, staff));
    },
  });
  const kinds = staff ? STAFF_NOTIFICATION_KINDS : ATHLETE_NOTIFICATION_KINDS;

  return (
    <Form
      form={form}
      onSubmit={(values) => {
        setSaved(false);
        return update.mutateAsync(values);
      }}
      aria-label="E-mail"
      className="space-y-5"
      data-testid="notification-preferences"
    >
      {saved ? <Alert tone="success">E-mail choices saved.</Alert> : null}
      <fieldset className="space-y-2">
        <legend className="mb-1.5 font-semibold text-ink">Send me an e-mail when</legend>
        {kinds.map((kind) => (
          <Checkbox key={kind} name={`enabled.${kind}`} label={NOTIFICATION_LABELS[kind]} />
        ))}
      </fieldset>
      {staff ? null : (
        <Select
          name="reminderHour"
          label="Morning reminder time"
          options={HOUR_OPTIONS}
          registerOptions={{ setValueAs: readHour }}
          hint={
            <>
              On your own clock ({timeZone.replaceAll('_', ' ')}). If no weigh-in is logged by then, we send
              one reminder that morning.
            </>
          }
          className="max-w-xs"
        />
      )}
      <SubmitButton pendingLabel="Saving…">Save e-mail choices</SubmitButton>
    </Form>
  );
}
