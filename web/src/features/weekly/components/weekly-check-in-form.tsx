import {
  submitWeeklyCheckInRequest,
  type CheckInQuestion,
  type SubmitWeeklyCheckInRequest,
  type WeeklyCheckInView,
} from '@driftmark/shared';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { Form, SubmitButton } from '@/components/ui/form';
import { SegmentedField } from '@/components/ui/segmented-field';
import { TextArea } from '@/components/ui/text-area';
import { useSubmitWeeklyCheckIn } from '../api/submit-weekly-check-in';
import { toAnswerValue, toFormValues, type WeeklyFormValues } from '../utils/weekly';

const SCALE_OPTIONS = [1, 2, 3, 4, 5].map((n) => ({
  value: String(n),
  label: String(n),
  ariaLabel: `${n} of 5`,
}));
const YES_NO_OPTIONS = [
  { value: 'yes', label: 'Yes' },
  { value: 'no', label: 'No' },
];

/** The form's strings, checked and turned into the shared request (the same schema the API checks). */
function schemaFor(questions: CheckInQuestion[]) {
  const kinds = new Map(questions.map((q) => [q.id, q.kind]));
  return z
    .object({
      dueDate: z.string(),
      answers: z.array(z.object({ questionId: z.string(), value: z.string() })),
      questionsForCoach: z.string(),
    })
    .transform((v): SubmitWeeklyCheckInRequest => ({
      dueDate: v.dueDate,
      answers: v.answers.map((a) => ({
        questionId: a.questionId,
        value: toAnswerValue(kinds.get(a.questionId), a.value),
      })),
      questionsForCoach: v.questionsForCoach.trim() === '' ? null : v.questionsForCoach,
    }))
    .pipe(submitWeeklyCheckInRequest);
}

/** The athlete's weekly form: the coach's questions by kind, then their own questions. */
export function WeeklyCheckInForm({
  athleteId,
  view,
  onSubmitted,
}: {
  athleteId: string;
  view: WeeklyCheckInView;
  onSubmitted?: (view: WeeklyCheckInView) => void;
}) {
  const form = useForm<WeeklyFormValues, unknown, SubmitWeeklyCheckInRequest>({
    resolver: zodResolver(schemaFor(view.questions)),
    defaultValues: toFormValues(view),
  });
  const submit = useSubmitWeeklyCheckIn(athleteId, { onSuccess: onSubmitted });

  return (
    <Form
      form={form}
      onSubmit={(values) => submit.mutateAsync(values)}
      // The due date has no control: a message about it goes to the top of the form.
      mapServerField={(path) => (path === 'dueDate' ? null : path)}
      aria-label="Weekly check-in"
      className="space-y-5"
    >
      {view.questions.length > 0 ? (
        <div className="space-y-5">
          <h2 className="text-lg font-semibold text-ink">Your coach asks</h2>
          {view.questions.map((q, i) =>
            q.kind === 'text' ? (
              <TextArea key={q.id} name={`answers.${i}.value`} label={q.prompt} rows={3} maxLength={1000} />
            ) : (
              <SegmentedField
                key={q.id}
                name={`answers.${i}.value`}
                legend={q.prompt}
                options={q.kind === 'scale' ? SCALE_OPTIONS : YES_NO_OPTIONS}
                size="lg"
                hint={q.kind === 'scale' ? '1 is low, 5 is high' : undefined}
              />
            ),
          )}
        </div>
      ) : null}
      <TextArea
        name="questionsForCoach"
        label="Questions for your coach"
        hint="Anything you want to ask or tell your coach about the week."
        rows={4}
        maxLength={2000}
      />
      <SubmitButton size="lg" className="w-full" pendingLabel="Sending…">
        {view.status === 'submitted' ? 'Send the changes' : 'Send to my coach'}
      </SubmitButton>
    </Form>
  );
}
