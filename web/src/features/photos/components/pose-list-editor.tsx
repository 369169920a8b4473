import { LIMITS, RELAXED_POSES } from '@driftmark/shared';
import { useId, useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { controlClasses } from '@/components/ui/field';
import { PlusIcon, TrashIcon } from '@/components/ui/icons';
import { Skeleton } from '@/components/ui/spinner';
import { cn } from '@/lib/cn';
import { usePoses } from '../api/get-poses';
import { useUpdatePoses } from '../api/update-poses';

const RELAXED: readonly string[] = RELAXED_POSES;

/** The team's pose list for coaches: the relaxed poses are fixed; the division's poses are added here. */
export function PoseListEditor() {
  const poses = usePoses();
  const [draft, setDraft] = useState<string[] | null>(null);
  const [name, setName] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  const inputId = useId();
  const update = useUpdatePoses({
    onSuccess: () => {
      setDraft(null);
      setSaved(true);
    },
  });

  if (poses.isPending) return <Skeleton className="h-40" />;
  if (poses.isError)
    return (
      <Alert tone="error" title="The poses could not be loaded.">
        {poses.error.message}
      </Alert>
    );

  const own = draft ?? poses.data.filter((p) => !RELAXED.includes(p));
  const changed = draft !== null;

  const add = () => {
    const pose = name.trim().replace(/\s+/g, ' ');
    setSaved(false);
    if (!pose) return setProblem('Type the name of a pose.');
    if (pose.length > LIMITS.poseName.max) return setProblem(`At most ${LIMITS.poseName.max} characters.`);
    if ([...RELAXED, ...own].some((p) => p.toLocaleLowerCase('en') === pose.toLocaleLowerCase('en')))
      return setProblem('That pose is already on the list.');
    if (own.length >= LIMITS.posesPerTeam) return setProblem(`At most ${LIMITS.posesPerTeam} poses.`);
    setProblem(null);
    setDraft([...own, pose]);
    setName('');
  };

  return (
    <div className="space-y-4">
      <ul aria-label="Poses" className="flex flex-wrap gap-2">
        {RELAXED.map((p) => (
          <li key={p}>
            <Badge tone="neutral">{p}</Badge>
          </li>
        ))}
        {own.map((p) => (
          <li key={p}>
            <span className="inline-flex items-center gap-1 rounded-pill bg-accent-soft py-0.5 pr-0.5 pl-2.5 text-xs font-semibold text-accent-strong">
              {p}
              <button
                type="button"
                className="flex size-7 items-center justify-center rounded-pill text-sm hover:bg-surface"
                aria-label={`Remove ${p}`}
                onClick={() => {
                  setSaved(false);
                  setDraft(own.filter((x) => x !== p));
                }}
              >
                <TrashIcon />
              </button>
            </span>
          </li>
        ))}
      </ul>
      <div>
        <label htmlFor={inputId} className="mb-1.5 block font-semibold text-ink">
          Add a pose
        </label>
        <div className="flex gap-2">
          <input
            id={inputId}
            value={name}
            maxLength={LIMITS.poseName.max}
            onChange={(e) => setName(e.target.value)}
            onKeyDown={(e) => {
              if (e.key === 'Enter') {
                e.preventDefault();
                add();
              }
            }}
            placeholder="e.g. Front double biceps"
            aria-invalid={problem ? true : undefined}
            aria-describedby={problem ? `${inputId}-error` : `${inputId}-hint`}
            className={cn(controlClasses, problem ? 'border-off-plan' : 'border-line-strong')}
          />
          <Button variant="secondary" icon={<PlusIcon />} onClick={add}>
            Add
          </Button>
        </div>
        {problem ? (
          <p id={`${inputId}-error`} className="mt-1.5 text-sm font-medium text-off-plan">
            {problem}
          </p>
        ) : (
          <p id={`${inputId}-hint`} className="mt-1.5 text-sm text-ink-faint">
            The division’s mandatory poses. Front, side and back relaxed are always there.
          </p>
        )}
      </div>
      {update.isError ? <Alert tone="error">{update.error.message}</Alert> : null}
      {saved ? <Alert tone="success">Poses saved.</Alert> : null}
      <div className="flex gap-2">
        <Button disabled={!changed} loading={update.isPending} onClick={() => update.mutate({ poses: own })}>
          Save poses
        </Button>
        {changed ? (
          <Button variant="ghost" onClick={() => setDraft(null)}>
            Undo changes
          </Button>
        ) : null}
      </div>
    </div>
  );
}
