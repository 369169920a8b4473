import {
  checkInQuestionsRequest,
  QUESTION_KIND_LABELS,
  QUESTION_KINDS,
  type CheckInQuestion,
  type CheckInQuestionsRequest,
} from '@driftmark/shared';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useFieldArray, useForm } from 'react-hook-form';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Form, SubmitButton } from '@/components/ui/form';
import { Select } from '@/components/ui/select';
import { Skeleton } from '@/components/ui/spinner';
import { TextField } from '@/components/ui/text-field';
import { useCheckInQuestions } from '../api/get-check-in-questions';
import { useUpdateCheckInQuestions } from '../api/update-check-in-questions';

const KIND_OPTIONS = QUESTION_KINDS.map((k) => ({ value: k, label: QUESTION_KIND_LABELS[k] }));
const MAX_QUESTIONS = 12;

/** The team's weekly check-in questions: owner and coach add, remove, reorder and edit them. */
export function CheckInQuestionsEditor({ canEdit }: { canEdit: boolean }) {
  const query = useCheckInQuestions();
  if (query.isPending) {
    return (
      <div aria-busy="true" aria-label="Loading the questions" className="space-y-3">
        <Skeleton className="h-16" />
        <Skeleton className="h-16" />
      </div>
    );
  }
  if (query.isError) {
    return (
      <Alert
        tone="error"
        title="The questions could not be loaded."
        action={
          <Button variant="secondary" onClick={() => void query.refetch()}>
            Try again
          </Button>
        }
      >
        {query.error.message}
      </Alert>
    );
  }
  const questions = query.data.data;
  if (!(query.data.abilities.manage ?? canEdit)) {
    return questions.length === 0 ? (
      <p className="text-sm text-ink-muted">No questions yet.</p>
    ) : (
      <ol className="list-decimal space-y-1 pl-5 text-sm text-ink">
        {questions.map((q) => (
          <li key={q.id}>
            {q.prompt} <span className="text-ink-faint">({QUESTION_KIND_LABELS[q.kind]})</span>
          </li>
        ))}
      </ol>
    );
  }
  return <QuestionsForm questions={questions} />;
}

function QuestionsForm({ questions }: { questions: CheckInQuestion[] }) {
  const form = useForm<CheckInQuestionsRequest>({
    resolver: zodResolver(checkInQuestionsRequest),
    defaultValues: { questions },
  });
  const { fields, append, remove, move } = useFieldArray({
    control: form.control,
    name: 'questions',
    keyName: 'key',
  });
  const [saved, setSaved] = useState(false);
  const update = useUpdateCheckInQuestions({
    onSuccess: (next) => {
      form.reset({ questions: next.length > 0 ? next : form.getValues('questions') });
      setSaved(true);
    },
  });

  return (
    <Form
      form={form}
      // An id has no control: a message about it goes to the top of the form.
      mapServerField={(path) => (path.endsWith('.id') ? null : path)}
      onSubmit={(values) => {
        setSaved(false);
        return update.mutateAsync(values);
      }}
      aria-label="Check-in questions"
      className="space-y-4"
    >
      {fields.length === 0 ? (
        <p className="text-sm text-ink-muted">
          No questions yet: athletes only see their week and their own questions.
        </p>
      ) : (
        <ol className="space-y-4" aria-label="Questions">
          {fields.map((field, i) => (
            <li key={field.key} className="rounded-md border border-line p-3">
              <fieldset className="space-y-3">
                <legend className="text-sm font-semibold text-ink tabular-nums">Question {i + 1}</legend>
                <TextField name={`questions.${i}.prompt`} label="Question" maxLength={200} />
                <Select name={`questions.${i}.kind`} label="Answer" options={KIND_OPTIONS} />
                <div className="flex flex-wrap gap-2">
                  <Button
                    variant="ghost"
                    size="sm"
                    disabled={i === 0}
                    onClick={() => move(i, i - 1)}
                    aria-label={`Move question ${i + 1} up`}
                  >
                    Up
                  </Button>
                  <Button
                    variant="ghost"
                    size="sm"
                    disabled={i === fields.length - 1}
                    onClick={() => move(i, i + 1)}
                    aria-label={`Move question ${i + 1} down`}
                  >
                    Down
                  </Button>
                  <Button
                    variant="ghost"
                    size="sm"
                    onClick={() => remove(i)}
                    aria-label={`Remove question ${i + 1}`}
                  >
                    Remove
                  </Button>
                </div>
              </fieldset>
            </li>
          ))}
        </ol>
      )}
      <div className="flex flex-wrap items-center gap-3">
        <Button
          variant="secondary"
          disabled={fields.length >= MAX_QUESTIONS}
          onClick={() => append({ id: crypto.randomUUID(), kind: 'text', prompt: '' })}
        >
          Add a question
        </Button>
        <SubmitButton pendingLabel="Saving…">Save the questions</SubmitButton>
        {saved ? (
          <p role="status" className="text-sm text-on-plan">
            Saved.
          </p>
        ) : null}
      </div>
    </Form>
  );
}
