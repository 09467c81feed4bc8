import type { FormEvent } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { SetMemberPinInput, type BenchTechnician } from '@keybed/shared';
import { Button } from '@/components/button';
import { FormError } from '@/components/form-error';
import { readForm, validateForm } from '@/lib/form';
import { showToast } from '@/lib/toast';
import { useFormErrors } from '@/lib/use-form-errors';
import { benchKeys } from '../api/keys';
import { setMemberPin } from '../api/set-member-pin';
import { usePinRequest } from '../hooks/use-pin-request';
import { pinRepeatError } from '../lib/pin-form';
import { PinFields } from './pin-fields';

/** The owner sets a member's PIN (which also lifts a lock), e.g. when they have forgotten theirs. */
export function MemberPinForm({ member, onDone }: { member: BenchTechnician; onDone: () => void }) {
  const queryClient = useQueryClient();
  const form = useFormErrors();
  const request = usePinRequest((pin: string) => setMemberPin(member.membershipId, { pin }));

  async function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const element = event.currentTarget;
    const values = readForm(element);
    const result = validateForm(SetMemberPinInput, { pin: values.pin ?? '' });
    const fields = { ...result.fields, ...pinRepeatError(values.pin ?? '', values.pinRepeat ?? '') };
    if (Object.keys(fields).length > 0 || !result.data) return form.showFields(fields);
    form.reset();
    const error = await request.run(result.data.pin);
    element.reset();
    if (error) return void form.showApiFields(error);
    showToast('success', `${member.name} has a new PIN. Tell them in person; Keybed never shows it again.`);
    void queryClient.invalidateQueries({ queryKey: benchKeys.technicians() });
    onDone();
  }

  return (
    <form ref={form.formRef} noValidate onSubmit={(e) => void submit(e)} className="space-y-3 rounded-md border border-graphite-300 bg-graphite-100 p-4">
      <FormError error={request.error} except={['validation_failed']} />
      <PinFields errorFor={form.errorFor} onEdit={form.clearField} whose={member.name} />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" size="sm" isPending={request.isPending}>
          Save the PIN for {member.name}
        </Button>
        <Button size="sm" variant="secondary" onClick={onDone} disabled={request.isPending}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
