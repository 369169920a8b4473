import {
  checkInDayRequest,
  WEEKDAY_LABELS,
  WEEKDAYS,
  type CheckInDayRequest,
  type Weekday,
} from '@driftmark/shared';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { QueryKey } from '@tanstack/react-query';
import { Form, SubmitButton } from '@/components/ui/form';
import { Select } from '@/components/ui/select';
import { useUpdateCheckInDay } from '../api/update-check-in-day';

const OPTIONS = WEEKDAYS.map((d) => ({ value: d, label: WEEKDAY_LABELS[d] }));

/** The athlete's check-in weekday (staff who may update the athlete). */
export function CheckInDayForm({
  athleteId,
  weekday,
  linkedKeys,
}: {
  athleteId: string;
  weekday: Weekday;
  linkedKeys?: QueryKey[];
}) {
  const form = useForm<CheckInDayRequest>({
    resolver: zodResolver(checkInDayRequest),
    defaultValues: { weekday },
  });
  const [saved, setSaved] = useState(false);
  const update = useUpdateCheckInDay(athleteId, { linkedKeys, onSuccess: () => setSaved(true) });
  return (
    <Form
      form={form}
      onSubmit={(values) => {
        setSaved(false);
        return update.mutateAsync(values);
      }}
      aria-label="Check-in day"
      className="flex flex-wrap items-end gap-3"
    >
      <Select name="weekday" label="Check-in day" options={OPTIONS} className="min-w-40" />
      <SubmitButton variant="secondary">Save the day</SubmitButton>
      {saved ? (
        <p role="status" className="text-sm text-on-plan">
          Saved.
        </p>
      ) : null}
    </Form>
  );
}
