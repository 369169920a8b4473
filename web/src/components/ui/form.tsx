import { useEffect, useRef, type FormHTMLAttributes, type ReactNode } from 'react';
import {
  FormProvider,
  useFormContext,
  useFormState,
  type FieldValues,
  type Path,
  type UseFormReturn,
} from 'react-hook-form';
import { isApiError } from '@/lib/api-client';
import { Alert } from './alert';
import { Button, type ButtonSize, type ButtonVariant } from './button';

const ROOT_KEY = 'root.server' as const;

interface FormProps<TFieldValues extends FieldValues, TTransformed> extends Omit<
  FormHTMLAttributes<HTMLFormElement>,
  'onSubmit' | 'children'
> {
  form: UseFormReturn<TFieldValues, unknown, TTransformed>;
  onSubmit: (values: TTransformed) => unknown;
  /**
   * Maps a field path from the API's `fields` to a field of this form when the names differ
   * (e.g. heightCm → heightFt when the athlete types feet and inches). Return null to show the
   * message at the top of the form instead; paths that are not fields of the form go there too.
   */
  mapServerField?: (path: string) => string | null;
  children: ReactNode;
}

/**
 * The one form wrapper: wires react-hook-form, blocks native bubbles (the schema speaks instead),
 * and turns an ApiError into messages: `validation_failed` fields beside their controls, anything
 * else in one alert at the top of the form.
 */
export function Form<TFieldValues extends FieldValues, TTransformed = TFieldValues>({
  form,
  onSubmit,
  mapServerField,
  children,
  ...formProps
}: FormProps<TFieldValues, TTransformed>) {
  const handle = form.handleSubmit(async (values) => {
    form.clearErrors(ROOT_KEY as Path<TFieldValues>);
    try {
      await onSubmit(values);
    } catch (error) {
      const leftOver: string[] = [];
      let first = true;
      // validation_failed carries fields; so may a conflict ("that e-mail already has an account").
      if (isApiError(error) && Object.keys(error.fields).length > 0) {
        const known = new Set(Object.keys(form.getValues() as Record<string, unknown>));
        for (const [path, message] of Object.entries(error.fields)) {
          const target = mapServerField ? mapServerField(path) : path;
          const top = target?.split('.')[0];
          if (target && top && known.has(top)) {
            form.setError(target as Path<TFieldValues>, { type: 'server', message }, { shouldFocus: first });
            first = false;
          } else {
            leftOver.push(message);
          }
        }
        if (leftOver.length === 0) return;
      }
      const message = leftOver.length
        ? leftOver.join(' ')
        : isApiError(error)
          ? error.message
          : 'Something went wrong. Please try again.';
      form.setError(ROOT_KEY as Path<TFieldValues>, { type: 'server', message });
    }
  });

  return (
    <FormProvider {...(form as unknown as UseFormReturn<FieldValues>)}>
      <form noValidate {...formProps} onSubmit={handle}>
        <FormMessage />
        {children}
      </form>
    </FormProvider>
  );
}

/** The form-level error from the server, announced when it appears. */
function FormMessage() {
  const { control } = useFormContext();
  const { errors } = useFormState({ control });
  const message = (errors.root as Record<string, { message?: string }> | undefined)?.server?.message;
  const ref = useRef<HTMLDivElement>(null);
  useEffect(() => {
    if (message) ref.current?.scrollIntoView({ block: 'nearest' });
  }, [message]);
  if (!message) return null;
  return (
    <div ref={ref} className="mb-5">
      <Alert tone="error">{message}</Alert>
    </div>
  );
}

interface SubmitButtonProps {
  children: ReactNode;
  variant?: ButtonVariant;
  size?: ButtonSize;
  className?: string;
  /** Words for the button while the request runs. */
  pendingLabel?: string;
}

export function SubmitButton({
  children,
  variant = 'primary',
  size = 'md',
  className,
  pendingLabel,
}: SubmitButtonProps) {
  const { control } = useFormContext();
  const { isSubmitting } = useFormState({ control });
  return (
    <Button type="submit" variant={variant} size={size} loading={isSubmitting} className={className}>
      {isSubmitting && pendingLabel ? pendingLabel : children}
    </Button>
  );
}
