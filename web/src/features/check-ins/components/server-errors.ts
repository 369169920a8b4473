import type { FieldValues, Path, UseFormReturn } from 'react-hook-form';
import { isApiError } from '@/lib/api-client';

/**
 * For writes that do not go through <Form>'s submit (a quick-add button): server `fields` land
 * beside their box when the form has it, anything else in the form's top message.
 */
export function showServerError<V extends FieldValues>(
  form: UseFormReturn<V, unknown, unknown>,
  error: unknown,
  fields: ReadonlyArray<Path<V>>,
): void {
  const leftOver: string[] = [];
  if (isApiError(error) && Object.keys(error.fields).length > 0) {
    for (const [path, message] of Object.entries(error.fields)) {
      if ((fields as readonly string[]).includes(path))
        form.setError(path as Path<V>, { type: 'server', message });
      else leftOver.push(message);
    }
    if (leftOver.length === 0) return;
  }
  const message = leftOver.length
    ? leftOver.join(' ')
    : isApiError(error)
      ? error.message
      : 'Something went wrong. Please try again.';
  form.setError('root.server' as Path<V>, { type: 'server', message });
}
