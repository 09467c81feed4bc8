import type { FormEvent } from 'react';
import { readForm, validateForm, type FormSchema } from './form';
import { useFormErrors } from './use-form-errors';

interface Submitter<T> {
  reset(): void;
  mutate(input: T, options: { onSuccess?: () => void; onError?: (error: Error) => void }): void;
}

interface Options<T> {
  /** Values the form does not hold as inputs (e.g. a token from the URL). */
  extra?: () => Partial<Record<keyof T, unknown>>;
  onSuccess?: () => void;
  /** Defaults to putting the API's `fields` on the inputs. */
  onError?: (error: Error, form: ReturnType<typeof useFormErrors>) => void;
}

/**
 * A form checked with the API's own schema before it is sent: errors go beside the fields and
 * focus moves to the first one; an error clears as that field is edited. Spread `formProps` on
 * the <form>.
 */
export function useSchemaForm<T>(schema: FormSchema<T>, mutation: Submitter<T>, options: Options<T> = {}) {
  const form = useFormErrors();

  function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const result = validateForm(schema, { ...readForm(event.currentTarget), ...options.extra?.() });
    if (result.fields) {
      mutation.reset();
      form.showFields(result.fields);
      return;
    }
    form.reset();
    mutation.mutate(result.data, {
      onSuccess: options.onSuccess,
      onError: (error) => (options.onError ? options.onError(error, form) : form.showApiFields(error)),
    });
  }

  const formProps = {
    ref: form.formRef,
    noValidate: true,
    onSubmit,
    onInput: (event: FormEvent<HTMLFormElement>) => form.clearField((event.target as HTMLInputElement).name),
  };
  return { ...form, formProps };
}
