import { LIMITS, updateSettingsRequest, type Me, type UpdateSettingsRequest } from '@driftmark/shared';
import { zodResolver } from '@hookform/resolvers/zod';
import { useMemo, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { Alert } from '@/components/ui/alert';
import { Form, SubmitButton } from '@/components/ui/form';
import { RadioGroup } from '@/components/ui/radio-group';
import { Select } from '@/components/ui/select';
import { TextField } from '@/components/ui/text-field';
import { timeZoneOptions } from '@/lib/time-zones';
import { useUpdateSettings } from '../api/update-settings';

type SettingsValues = Required<UpdateSettingsRequest>;

export function SettingsForm({ me, onSaved }: { me: Me; onSaved: (me: Me) => void }) {
  const [saved, setSaved] = useState(false);
  const form = useForm<SettingsValues>({
    resolver: zodResolver(updateSettingsRequest.required()),
    defaultValues: {
      name: me.name,
      timeZone: me.timeZone,
      weightUnit: me.units.weight,
      volumeUnit: me.units.volume,
    },
  });
  const timeZone = useWatch({ control: form.control, name: 'timeZone' });
  const zones = useMemo(() => timeZoneOptions(timeZone, me.timeZone), [timeZone, me.timeZone]);
  const update = useUpdateSettings({
    onSuccess: (next) => {
      setSaved(true);
      form.reset({
        name: next.name,
        timeZone: next.timeZone,
        weightUnit: next.units.weight,
        volumeUnit: next.units.volume,
      });
      onSaved(next);
    },
  });

  return (
    <Form
      form={form}
      onSubmit={(values) => {
        setSaved(false);
        return update.mutateAsync(values);
      }}
      aria-label="Profile and units"
      className="space-y-5"
    >
      {saved ? <Alert tone="success">Settings saved.</Alert> : null}
      <TextField name="name" label="Name" autoComplete="name" maxLength={LIMITS.name.max} required />
      <RadioGroup
        name="weightUnit"
        legend="Weight"
        options={[
          { value: 'kg', label: 'kg' },
          { value: 'lb', label: 'lb' },
        ]}
        required
      />
      <RadioGroup
        name="volumeUnit"
        legend="Fluids"
        options={[
          { value: 'ml', label: 'mL' },
          { value: 'floz', label: 'US fl oz' },
        ]}
        required
      />
      <Select
        name="timeZone"
        label="Time zone"
        options={zones}
        hint="Days, reminders and countdowns follow this clock."
        required
      />
      <SubmitButton pendingLabel="Saving…">Save settings</SubmitButton>
    </Form>
  );
}
