import { useState } from 'react';
import type { Client } from '@keybed/shared';
import { Button } from '@/components/button';
import { ErrorState } from '@/components/error-state';
import { SearchField } from '@/components/search-field';
import { Skeleton } from '@/components/skeleton';
import { useClients } from '../api/get-clients';
import { ClientForm } from './client-form';

interface ClientPickerProps {
  selectedId: string | null;
  onSelect: (client: Pick<Client, 'id' | 'name'>) => void;
}

/** Choose the client a new job is for: search, pick one, or add them here without leaving. */
export function ClientPicker({ selectedId, onSelect }: ClientPickerProps) {
  const [q, setQ] = useState('');
  const [isAdding, setIsAdding] = useState(false);
  const clients = useClients(q ? { q } : {});

  if (isAdding) {
    return (
      <div className="space-y-3">
        <h3 className="font-semibold">New client</h3>
        <ClientForm
          onSaved={(client) => {
            setIsAdding(false);
            onSelect(client);
          }}
          onCancel={() => setIsAdding(false)}
        />
      </div>
    );
  }

  return (
    <div className="space-y-3">
      <SearchField label="Find a client" value={q} onSearch={setQ} placeholder="Name or e-mail" isCompact />
      {clients.isPending ? (
        <Skeleton className="h-24 w-full" />
      ) : clients.isError ? (
        <ErrorState error={clients.error} onRetry={() => void clients.refetch()} headingLevel="h4" />
      ) : (
        <fieldset>
          <legend className="sr-only">Client</legend>
          {clients.data.length === 0 && <p className="text-graphite-600">{q ? `No clients match “${q}”.` : 'No clients yet.'}</p>}
          <div className="max-h-64 space-y-1 overflow-y-auto">
            {clients.data.map((client) => (
              <label key={client.id} className="flex min-h-11 items-center gap-3 rounded-md px-2 hover:bg-graphite-100 has-checked:bg-spruce-light">
                <input
                  type="radio"
                  name="clientId"
                  value={client.id}
                  checked={selectedId === client.id}
                  onChange={() => onSelect(client)}
                  className="size-5 accent-walnut"
                />
                <span>
                  <span className="font-semibold">{client.name}</span>
                  {client.email && <span className="block text-sm text-graphite-600">{client.email}</span>}
                </span>
              </label>
            ))}
          </div>
        </fieldset>
      )}
      <Button variant="secondary" size="sm" onClick={() => setIsAdding(true)}>
        Add a new client
      </Button>
    </div>
  );
}
