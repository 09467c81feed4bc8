import { useNavigate } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { useSignedInMember } from '@/features/auth/hooks/use-signed-in-member';
import { ClientForm } from '@/features/clients/components/client-form';
import { showToast } from '@/lib/toast';
import { RunnersOnly } from '../layout/runners-only';

export function Component() {
  const me = useSignedInMember();
  const navigate = useNavigate();
  return (
    <>
      <title>{`Add a client · ${me.workshop.name} · Keybed`}</title>
      <PageHeader title="Add a client" description="Then add their piano and start a job on it." />
      <RunnersOnly role={me.role} what="add clients">
        <div className="max-w-2xl">
          <ClientForm
            onSaved={(client) => {
              showToast('success', `${client.name} is added.`);
              void navigate(paths.client.build(client.id));
            }}
            onCancel={() => void navigate(paths.clients.build())}
          />
        </div>
      </RunnersOnly>
    </>
  );
}
