import { useCallback, useEffect, useRef, useState } from 'react';
import type { FieldErrors } from '@keybed/shared';
import { isApiError } from './api-client';

/**
 * Field errors for one form, from client-side validation or the API's `fields`.
 * After each failed submit, focus moves to the first invalid control so it is heard and seen.
 */
export function useFormErrors() {
  const formRef = useRef<HTMLFormElement>(null);
  const [fields, setFieldsState] = useState<FieldErrors>({});
  const [focusRequest, setFocusRequest] = useState(0);

  useEffect(() => {
    if (focusRequest === 0) return;
    formRef.current?.querySelector<HTMLElement>('[aria-invalid="true"]')?.focus();
  }, [focusRequest]);

  const showFields = useCallback((next: FieldErrors) => {
    setFieldsState(next);
    setFocusRequest((count) => count + 1);
  }, []);

  /** Puts an API error's `fields` on the inputs; returns whether there were any. */
  const showApiFields = useCallback(
    (error: unknown) => {
      if (!isApiError(error) || !error.fields || Object.keys(error.fields).length === 0) return false;
      showFields(error.fields);
      return true;
    },
    [showFields],
  );

  /** Clears one field's error once the person edits it. */
  const clearField = useCallback((name: string) => {
    setFieldsState((current) => {
      if (!(name in current)) return current;
      const { [name]: _removed, ...rest } = current;
      return rest;
    });
  }, []);

  const errorFor = (name: string) => fields[name]?.[0];

  return { formRef, fields, errorFor, showFields, showApiFields, clearField, reset: () => setFieldsState({}) };
}
