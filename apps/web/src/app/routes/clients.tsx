import { useSearchParams } from 'react-router-dom';
import { ButtonLink } from '@/components/button';
import { PageHeader } from '@/components/page-header';
import { SearchField } from '@/components/search-field';
import { paths } from '@/config/paths';
import { useSignedInMember } from '@/features/auth/hooks/use-signed-in-member';
import { ClientList } from '@/features/clients/components/client-list';
import { canRunBoard } from '@/lib/roles';

export function Component() {
  const me = useSignedInMember();
  const [params, setParams] = useSearchParams();
  const q = params.get('q')?.trim() ?? '';
  const canEdit = canRunBoard(me.role);
  return (
    <>
      <title>{`Clients · ${me.workshop.name} · Keybed`}</title>
      <PageHeader
        title="Clients"
        description="The people and places whose pianos come to the workshop."
        actions={canEdit ? <ButtonLink to={paths.newClient.build()}>Add a client</ButtonLink> : undefined}
      />
      <div role="search" aria-label="Find clients" className="mb-4 max-w-md">
        <SearchField
          label="Search clients"
          placeholder="Name or e-mail"
          value={q}
          onSearch={(text) => setParams(text ? { q: text } : {}, { replace: true })}
        />
      </div>
      <ClientList q={q} canEdit={canEdit} />
    </>
  );
}
