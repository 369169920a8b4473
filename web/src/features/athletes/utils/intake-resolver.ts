import { intakeRequestOn, type IntakeRequest } from '@driftmark/shared';
import { zodResolver } from '@hookform/resolvers/zod';
import type { FieldError, FieldErrors, Resolver } from 'react-hook-form';
import {
  formFieldFor,
  messageInUnits,
  toIntakeRequest,
  type IntakeFormField,
  type IntakeFormValues,
} from './intake-values';

/** The device's own date (the server checks again against its clock). */
function localToday(): string {
  const d = new Date();
  return `${d.getFullYear()}-${String(d.getMonth() + 1).padStart(2, '0')}-${String(d.getDate()).padStart(2, '0')}`;
}

/**
 * Validates the intake with the shared `intakeRequestOn` schema: the typed values are first
 * converted to SI (the shape the API takes), then checked, and each error is put back on the box
 * the athlete typed into, in their units. On success the form hands over the SI request.
 */
export function createIntakeResolver(
  today: string = localToday(),
): Resolver<IntakeFormValues, unknown, IntakeRequest> {
  const schemaResolver = zodResolver(intakeRequestOn(today));
  return async (values, context, options) => {
    const { request, numberErrors } = toIntakeRequest(values);
    const result = await (
      schemaResolver as unknown as Resolver<Record<string, unknown>, unknown, IntakeRequest>
    )(request, context, options as never);
    const errors: Partial<Record<IntakeFormField, FieldError>> = {};
    const unplaced: string[] = [];
    const refOf = (field: IntakeFormField) => options.fields?.[field]?.ref;

    for (const [field, message] of Object.entries(numberErrors) as Array<[IntakeFormField, string]>) {
      errors[field] = { type: 'number', message, ref: refOf(field) };
    }
    for (const [path, raw] of Object.entries(result.errors as Record<string, FieldError | undefined>)) {
      if (!raw) continue;
      const field = formFieldFor(path, values.weightUnit);
      if (!field) {
        unplaced.push(raw.message ?? path);
        continue;
      }
      if (errors[field]) continue;
      errors[field] = {
        type: raw.type,
        message: messageInUnits(path, String(raw.type), raw.message ?? 'Check this value', values),
        ref: refOf(field),
      };
    }

    if (
      Object.keys(errors).length === 0 &&
      unplaced.length === 0 &&
      Object.keys(result.errors).length === 0
    ) {
      return { values: result.values as IntakeRequest, errors: {} };
    }
    const all = errors as FieldErrors<IntakeFormValues>;
    // Never report "valid" while the schema still objects to something, even off-screen.
    if (unplaced.length > 0 || Object.keys(errors).length === 0) {
      all.root = { server: { type: 'schema', message: unplaced.join(' ') || 'Check the form.' } } as never;
    }
    return { values: {}, errors: all };
  };
}
