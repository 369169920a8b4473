import { replyWeeklyCheckInRequest, type ReplyWeeklyCheckInRequest } from '@driftmark/shared';
import { zodResolver } from '@hookform/resolvers/zod';
import type { QueryKey } from '@tanstack/react-query';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { Form, SubmitButton } from '@/components/ui/form';
import { Select, type SelectOption } from '@/components/ui/select';
import { TextArea } from '@/components/ui/text-area';
import { useReplyWeeklyCheckIn } from '../api/reply-weekly-check-in';

interface ReplyFormValues {
  body: string;
  planVersionId: string;
}

const formSchema = z
  .object({ body: z.string(), planVersionId: z.string() })
  .transform((v): z.input<typeof replyWeeklyCheckInRequest> => ({
    body: v.body,
    planVersionId: v.planVersionId === '' ? null : v.planVersionId,
  }))
  .pipe(replyWeeklyCheckInRequest);

/** The coach's reply to a check-in; it may name a plan version saved for it. */
export function WeeklyReplyForm({
  athleteId,
  checkInId,
  planVersions,
  linkedKeys,
}: {
  athleteId: string;
  checkInId: string;
  /** Plan versions the reply may link to ("v4 from 8 Dec"), newest first. */
  planVersions: readonly SelectOption[];
  linkedKeys?: QueryKey[];
}) {
  const form = useForm<ReplyFormValues, unknown, ReplyWeeklyCheckInRequest>({
    resolver: zodResolver(formSchema),
    defaultValues: { body: '', planVersionId: '' },
  });
  const reply = useReplyWeeklyCheckIn(athleteId, checkInId, { linkedKeys });
  return (
    <Form
      form={form}
      onSubmit={(values) => reply.mutateAsync(values)}
      aria-label="Reply"
      className="space-y-4"
    >
      <TextArea name="body" label="Your reply" rows={5} maxLength={4000} required />
      {planVersions.length > 0 ? (
        <Select
          name="planVersionId"
          label="Plan change with this reply"
          placeholder="No plan change"
          options={planVersions}
          hint="Save the new plan version first, then pick it here."
        />
      ) : null}
      <SubmitButton pendingLabel="Sending…">Send the reply</SubmitButton>
    </Form>
  );
}
