import { LIMITS, photoUploadFields } from '@driftmark/shared';
import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useId, useMemo, useState, type ChangeEvent } from 'react';
import { useForm, useFormContext, useWatch } from 'react-hook-form';
import { z } from 'zod';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { FieldErrorText, FieldHint, RequiredMark, useFieldError } from '@/components/ui/field';
import { Form, SubmitButton } from '@/components/ui/form';
import { CameraIcon, PlusIcon } from '@/components/ui/icons';
import { Select } from '@/components/ui/select';
import { TextField } from '@/components/ui/text-field';
import { cn } from '@/lib/cn';
import { formatDate, formatNumber } from '@/lib/format';
import { usePoses } from '../api/get-poses';
import { useUploadPhotos } from '../api/upload-photos';
import type { PhotoView } from '../api/types';
import { checkChosenFiles, PHOTO_ACCEPT } from '../utils/photo-sets';

const MB = 1024 * 1024;

function uploadSchema(today: string) {
  return photoUploadFields
    .extend({
      files: z.array(z.custom<File>((v) => v instanceof File)),
    })
    .superRefine((values, ctx) => {
      const problem = checkChosenFiles(values.files);
      if (problem) ctx.addIssue({ code: 'custom', path: ['files'], message: problem });
      if (values.date > today)
        ctx.addIssue({ code: 'custom', path: ['date'], message: 'That date is still in the future' });
    });
}

type UploadValues = z.input<ReturnType<typeof uploadSchema>>;

const sameFile = (a: File, b: File) =>
  a.name === b.name && a.size === b.size && a.lastModified === b.lastModified;

/** Object URLs for previews, revoked when the files change or the form goes away. */
function usePreviews(files: readonly File[]): string[] {
  const urls = useMemo(() => files.map((f) => URL.createObjectURL(f)), [files]);
  useEffect(() => () => urls.forEach((u) => URL.revokeObjectURL(u)), [urls]);
  return urls;
}

/** A chosen file's preview; a file the browser cannot draw says so instead of a broken image. */
function Preview({ src }: { src: string | undefined }) {
  const [failed, setFailed] = useState(false);
  if (!src || failed) {
    return (
      <span className="flex aspect-[3/4] w-full items-center justify-center p-2 text-center text-xs text-ink-muted">
        No preview
      </span>
    );
  }
  return (
    <img src={src} alt="" onError={() => setFailed(true)} className="aspect-[3/4] w-full object-cover" />
  );
}

function formatSize(bytes: number): string {
  return bytes >= MB
    ? `${formatNumber(bytes / MB, 1)} MB`
    : `${formatNumber(Math.max(1, Math.round(bytes / 1024)))} kB`;
}

/** The two pickers (library, camera), the chosen files with previews, and the field's error. */
function PhotoPicker({ disabled }: { disabled: boolean }) {
  const { control, setValue, formState } = useFormContext<UploadValues>();
  const files = useWatch({ control, name: 'files' });
  const error = useFieldError('files');
  const previews = usePreviews(files);
  const uid = useId().replace(/[^a-zA-Z0-9_-]/g, '');
  const ids = {
    library: `${uid}-library`,
    camera: `${uid}-camera`,
    hint: `${uid}-hint`,
    error: `${uid}-error`,
  };
  const describedBy = [error ? ids.error : null, ids.hint].filter(Boolean).join(' ');

  const setFiles = (next: File[]) =>
    setValue('files', next, { shouldValidate: formState.isSubmitted, shouldDirty: true });

  const add = (event: ChangeEvent<HTMLInputElement>) => {
    const picked = [...(event.target.files ?? [])];
    // Clearing the input lets the same photo be chosen again after removing it.
    event.target.value = '';
    setFiles([...files, ...picked.filter((f) => !files.some((g) => sameFile(f, g)))]);
  };

  const pickerClasses = cn(
    'flex min-h-touch cursor-pointer items-center justify-center gap-1.5 rounded-md border px-2 text-sm font-semibold whitespace-nowrap sm:text-base',
    'peer-focus-visible:outline-2 peer-focus-visible:outline-offset-2 peer-focus-visible:outline-accent',
    'peer-disabled:cursor-not-allowed peer-disabled:opacity-60',
  );

  return (
    <fieldset aria-describedby={describedBy} aria-invalid={error ? true : undefined} disabled={disabled}>
      <legend className="mb-1.5 flex items-baseline gap-2">
        <span className="font-semibold text-ink">Photos</span>
        <RequiredMark />
      </legend>
      <div className="grid grid-cols-2 gap-2">
        <div className="relative">
          <input
            id={ids.library}
            type="file"
            multiple
            accept={PHOTO_ACCEPT}
            onChange={add}
            className="peer sr-only"
            aria-describedby={describedBy}
          />
          <label
            htmlFor={ids.library}
            className={cn(
              pickerClasses,
              'border-line-strong bg-surface text-ink shadow-card hover:bg-sunken',
            )}
          >
            <PlusIcon className="text-lg" />
            Choose photos
          </label>
        </div>
        <div className="relative">
          <input
            id={ids.camera}
            type="file"
            accept={PHOTO_ACCEPT}
            capture="environment"
            onChange={add}
            className="peer sr-only"
            aria-describedby={describedBy}
          />
          <label
            htmlFor={ids.camera}
            className={cn(
              pickerClasses,
              'border-line-strong bg-surface text-ink shadow-card hover:bg-sunken',
            )}
          >
            <CameraIcon className="text-lg" />
            Take photo
          </label>
        </div>
      </div>
      <FieldErrorText id={ids.error} error={error} />
      <FieldHint id={ids.hint}>
        JPEG, PNG, WebP or AVIF, up to {LIMITS.photosPerUpload} at once,{' '}
        {Math.round(LIMITS.photoMaxBytes / MB)} MB each. Location and camera details are removed when they are
        stored.
      </FieldHint>
      {files.length > 0 ? (
        <ul aria-label="Chosen photos" className="mt-3 grid grid-cols-3 gap-2 sm:grid-cols-4">
          {files.map((file, i) => (
            <li key={`${file.name}-${file.size}-${file.lastModified}`} className="min-w-0">
              <div className="relative overflow-hidden rounded-md border border-line bg-sunken">
                <Preview src={previews[i]} />
                <button
                  type="button"
                  onClick={() => setFiles(files.filter((_, j) => j !== i))}
                  className="absolute top-1 right-1 flex size-8 items-center justify-center rounded-pill bg-ink/75 text-lg leading-none font-semibold text-surface hover:bg-ink"
                  aria-label={`Remove ${file.name}`}
                >
                  ×
                </button>
              </div>
              <p className="mt-1 truncate text-xs text-ink-muted" title={file.name}>
                {file.name}
              </p>
              <p className="text-xs text-ink-faint tabular-nums">{formatSize(file.size)}</p>
            </li>
          ))}
        </ul>
      ) : null}
    </fieldset>
  );
}

interface PhotoUploadFormProps {
  athleteId: string;
  /** The athlete's own today (YYYY-MM-DD): the default date and the latest allowed. */
  today: string;
  onUploaded?: (photos: PhotoView[]) => void;
  /** Opens the gallery (shown as a link after a successful upload). */
  onShowGallery?: () => void;
}

/** Upload condition photos for one date and pose: camera or library, several at once, with progress. */
export function PhotoUploadForm({ athleteId, today, onUploaded, onShowGallery }: PhotoUploadFormProps) {
  const poses = usePoses();
  const [progress, setProgress] = useState<number | null>(null);
  const [saved, setSaved] = useState<{ count: number; date: string; pose: string } | null>(null);
  const schema = useMemo(() => uploadSchema(today), [today]);
  const form = useForm<UploadValues>({
    resolver: zodResolver(schema),
    defaultValues: { date: today, pose: 'Front relaxed', files: [] },
  });
  const upload = useUploadPhotos(athleteId, {
    onProgress: setProgress,
    onSuccess: (photos) => onUploaded?.(photos),
  });
  const files = useWatch({ control: form.control, name: 'files' });
  const sending = progress !== null;

  return (
    <Form
      form={form}
      aria-label="Upload photos"
      className="space-y-5"
      onSubmit={async (values) => {
        setSaved(null);
        setProgress(0);
        try {
          const photos = await upload.mutateAsync({
            files: values.files,
            date: values.date,
            pose: values.pose,
          });
          setSaved({ count: photos.length, date: values.date, pose: values.pose });
          form.reset({ date: values.date, pose: values.pose, files: [] });
        } finally {
          setProgress(null);
        }
      }}
    >
      {saved ? (
        <Alert
          tone="success"
          title={`${saved.count} ${saved.count === 1 ? 'photo' : 'photos'} saved`}
          action={
            onShowGallery ? (
              <Button variant="secondary" onClick={onShowGallery}>
                See the gallery
              </Button>
            ) : undefined
          }
        >
          {saved.pose}, {formatDate(saved.date)}.
        </Alert>
      ) : null}
      <PhotoPicker disabled={sending} />
      <div className="grid gap-5 sm:grid-cols-2">
        <TextField name="date" type="date" label="Date" max={today} required disabled={sending} />
        <Select
          name="pose"
          label="Pose"
          required
          disabled={sending || poses.isPending}
          options={(poses.data ?? ['Front relaxed']).map((p) => ({ value: p, label: p }))}
          hint={
            poses.isError ? 'The team’s poses could not be loaded; the relaxed poses still work.' : undefined
          }
        />
      </div>
      <div className="space-y-3">
        <SubmitButton pendingLabel="Uploading…" className="w-full sm:w-auto">
          {files.length > 1 ? `Upload ${files.length} photos` : 'Upload photo'}
        </SubmitButton>
        {sending ? (
          <div role="status" aria-live="polite" className="space-y-1">
            <progress
              value={progress}
              max={1}
              aria-label="Upload progress"
              className="h-2 w-full overflow-hidden rounded-pill bg-sunken accent-accent [&::-moz-progress-bar]:bg-accent [&::-webkit-progress-bar]:bg-sunken [&::-webkit-progress-value]:bg-accent"
            />
            <p className="text-sm text-ink-muted tabular-nums">
              {progress !== null && progress >= 1
                ? 'Checking and storing the photos…'
                : `Sending… ${formatNumber((progress ?? 0) * 100)} %`}
            </p>
          </div>
        ) : null}
      </div>
    </Form>
  );
}
