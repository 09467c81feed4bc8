import type { FieldErrors } from '@keybed/shared';

interface Issue {
  path: readonly PropertyKey[];
  message: string;
}

/** Any zod schema from `@keybed/shared`; forms validate with the same schema the API uses. */
export interface FormSchema<T> {
  safeParse(value: unknown): { success: true; data: T } | { success: false; error: { issues: readonly Issue[] } };
}

export type FormResult<T> = { data: T; fields?: undefined } | { data?: undefined; fields: FieldErrors };

/** Text values of a form's named controls. */
export function readForm(form: HTMLFormElement): Record<string, string> {
  const values: Record<string, string> = {};
  for (const [name, value] of new FormData(form)) {
    if (typeof value === 'string') values[name] = value;
  }
  return values;
}

export function issuesToFields(issues: readonly Issue[]): FieldErrors {
  const fields: FieldErrors = {};
  for (const issue of issues) {
    const key = issue.path.map(String).join('.') || 'form';
    (fields[key] ??= []).push(issue.message);
  }
  return fields;
}

export function validateForm<T>(schema: FormSchema<T>, values: unknown): FormResult<T> {
  const result = schema.safeParse(values);
  return result.success ? { data: result.data } : { fields: issuesToFields(result.error.issues) };
}
