import { cutSettingsRequest, type CutSettingsRequest, type CutSettingsView } from '@driftmark/shared';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Form, SubmitButton } from '@/components/ui/form';
import { Skeleton } from '@/components/ui/spinner';
import { TextField } from '@/components/ui/text-field';
import { formatNumber, NBSP } from '@/lib/format';
import { readBoxNumber } from '@/lib/number-reader';
import { useCutSettings } from '../api/get-cut-settings';
import { useUpdateCutSettings } from '../api/update-cut-settings';

const pct = (n: number) => `${formatNumber(n, 1)}${NBSP}%`;

/** The default, the 7 % line and their sources, as the server sent them. */
function ThresholdNote({ view }: { view: CutSettingsView }) {
  return (
    <div className="space-y-2 text-sm text-ink-muted">
      <p>
        <span className="font-semibold text-ink">Default {pct(view.defaultPct)}.</span> A cut plan whose last
        days must take off more than this share of body mass carries a strong warning the coach acknowledges
        with the athlete. Source: {view.source}.
      </p>
      <p>
        <span className="font-semibold text-ink">What {pct(view.severePct)} means.</span> {view.severeMeaning}{' '}
        Source: {view.severeSource}.
      </p>
      <p>
        No figure here is a safe amount: the commission&apos;s rules decide the weigh-in, and any acute loss
        belongs with a physician.
      </p>
    </div>
  );
}

/**
 * The team's acute-share threshold for cut plans: the owner edits it, other staff read it. A new
 * plan is checked against it; saved plans keep the threshold they were saved with.
 */
export function AcuteShareForm({ canEdit, onSaved }: { canEdit: boolean; onSaved?: () => void }) {
  const query = useCutSettings();
  if (query.isPending) return <Skeleton className="h-24" aria-label="Loading the threshold" />;
  if (query.isError) {
    return (
      <Alert
        tone="error"
        title="The threshold could not be loaded."
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
  const view = query.data.data;
  const editable = 'manage' in query.data.abilities ? query.data.abilities.manage === true : canEdit;
  if (!editable) {
    return (
      <div className="space-y-4">
        <p className="text-sm text-ink">
          Acute share threshold:{' '}
          <span className="font-semibold tabular-nums" data-testid="acute-share-pct">
            {pct(view.acuteSharePct)}
          </span>{' '}
          of body mass{view.acuteSharePct === view.defaultPct ? ' (the default)' : ''}.
        </p>
        <p className="text-sm text-ink-muted">Only the head coach can change it.</p>
        <ThresholdNote view={view} />
      </div>
    );
  }
  return <ThresholdEditor view={view} onSaved={onSaved} />;
}

function ThresholdEditor({ view, onSaved }: { view: CutSettingsView; onSaved?: () => void }) {
  const [saved, setSaved] = useState(false);
  const form = useForm<CutSettingsRequest>({
    resolver: zodResolver(cutSettingsRequest),
    defaultValues: { acuteSharePct: view.acuteSharePct },
  });
  const update = useUpdateCutSettings({
    onSuccess: (next) => {
      setSaved(true);
      form.reset({ acuteSharePct: next.acuteSharePct });
      onSaved?.();
    },
  });
  return (
    <Form
      form={form}
      onSubmit={(values) => {
        setSaved(false);
        return update.mutateAsync(values);
      }}
      aria-label="Acute share threshold"
      className="space-y-4"
    >
      {saved ? <Alert tone="success">Threshold saved. New cut plans are checked against it.</Alert> : null}
      <TextField
        name="acuteSharePct"
        label="Acute share threshold"
        hint="Share of body mass the last days before the weigh-in may take off before a strong warning."
        suffix="%"
        inputMode="decimal"
        autoComplete="off"
        required
        registerOptions={{ setValueAs: readBoxNumber }}
        className="max-w-xs"
        inputClassName="tabular-nums"
      />
      <ThresholdNote view={view} />
      <div className="flex flex-wrap gap-2">
        <SubmitButton pendingLabel="Saving…">Save threshold</SubmitButton>
        <Button
          variant="ghost"
          onClick={() => {
            setSaved(false);
            form.setValue('acuteSharePct', view.defaultPct, { shouldDirty: true });
          }}
        >
          Use the default
        </Button>
      </div>
    </Form>
  );
}
