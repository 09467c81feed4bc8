import { type FormEvent } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { SetOwnPinInput } from '@keybed/shared';
import { Button } from '@/components/button';
import { Field } from '@/components/field';
import { FormError } from '@/components/form-error';
import { TextInput } from '@/components/text-input';
import { readForm, validateForm } from '@/lib/form';
import { showToast } from '@/lib/toast';
import { useFormErrors } from '@/lib/use-form-errors';
import { benchKeys } from '../api/keys';
import { setOwnPin } from '../api/set-own-pin';
import { usePinRequest } from '../hooks/use-pin-request';
import { pinRepeatError } from '../lib/pin-form';
import { PinFields } from './pin-fields';

/** Sets the member's own wall-screen PIN; their account password confirms it is them. */
export function OwnPinForm({ hasPin }: { hasPin: boolean }) {
  const queryClient = useQueryClient();
  const form = useFormErrors();
  const request = usePinRequest(setOwnPin);

  async function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const element = event.currentTarget;
    const values = readForm(element);
    const result = validateForm(SetOwnPinInput, { pin: values.pin ?? '', password: values.password ?? '' });
    const fields = { ...result.fields, ...pinRepeatError(values.pin ?? '', values.pinRepeat ?? '') };
    if (Object.keys(fields).length > 0 || !result.data) return form.showFields(fields);
    form.reset();
    const error = await request.run(result.data);
    if (!error) {
      element.reset();
      showToast('success', hasPin ? 'Your new PIN works at the wall screen now.' : 'Your PIN is set. You can clock on at the wall screen.');
      void queryClient.invalidateQueries({ queryKey: benchKeys.ownPin() });
    } else {
      element.querySelector<HTMLInputElement>('input[name="password"]')!.value = '';
      form.showApiFields(error);
    }
  }

  return (
    <form ref={form.formRef} noValidate onSubmit={(e) => void submit(e)} className="space-y-4">
      <FormError error={request.error} except={['validation_failed', 'invalid_credentials']} />
      <PinFields errorFor={form.errorFor} onEdit={form.clearField} />
      <Field label="Your Keybed password" hint="To confirm it is you" error={form.errorFor('password')}>
        {(control) => <TextInput {...control} type="password" name="password" autoComplete="current-password" className="max-w-sm" onChange={() => form.clearField('password')} />}
      </Field>
      <Button type="submit" isPending={request.isPending}>
        {hasPin ? 'Change my PIN' : 'Set my PIN'}
      </Button>
    </form>
  );
}
