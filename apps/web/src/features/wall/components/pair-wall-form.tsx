import { useState, type FormEvent } from 'react';
import { PairWallInput } from '@keybed/shared';
import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { Field } from '@/components/field';
import { FormError } from '@/components/form-error';
import { TextInput } from '@/components/text-input';
import { paths } from '@/config/paths';
import { validateForm } from '@/lib/form';
import { useFormErrors } from '@/lib/use-form-errors';
import { usePairWall } from '../api/pair-wall';

/**
 * Names the screen and pairs this browser. The API signs the member out here, so the page loads
 * the wall screen afresh rather than carrying the signed-in app's state across.
 */
export function PairWallForm({ workshopName }: { workshopName: string }) {
  const pair = usePairWall();
  const form = useFormErrors();
  const [name, setName] = useState('');

  function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const result = validateForm(PairWallInput, { name });
    if (result.fields) return form.showFields(result.fields);
    form.reset();
    pair.mutate(result.data, {
      onSuccess: () => window.location.assign(paths.wall.build()),
      onError: (error) => void form.showApiFields(error),
    });
  }

  return (
    <form ref={form.formRef} noValidate onSubmit={submit} className="max-w-2xl space-y-5">
      <Alert title="This browser becomes the workshop’s shared wall screen.">
        <p>
          You are signed out here. The screen shows who is working on what at {workshopName}, and clocks people on and off with their
          6-digit PINs; it can do nothing else. You can unpair it at any time under Wall screen.
        </p>
      </Alert>
      <FormError error={pair.error} except={['validation_failed']} />
      <Field label="Name of this screen" hint="So you can tell screens apart, e.g. Bench room screen" error={form.errorFor('name')}>
        {(control) => <TextInput {...control} value={name} maxLength={80} onChange={(e) => { setName(e.target.value); form.clearField('name'); }} className="max-w-md" />}
      </Field>
      <Button type="submit" isPending={pair.isPending}>
        Pair this browser
      </Button>
    </form>
  );
}
