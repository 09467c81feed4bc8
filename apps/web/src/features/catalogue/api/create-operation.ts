import { useMutation, useQueryClient } from '@tanstack/react-query';
import { CatalogueOperation, type CreateCatalogueOperationInput } from '@keybed/shared';
import { api } from '@/lib/api-client';
import { catalogueKeys } from './keys';

export const createOperation = (input: CreateCatalogueOperationInput) => api.post('/catalogue', input, CatalogueOperation);

export function useCreateOperation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createOperation,
    meta: { handlesError: true },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: catalogueKeys.lists() }),
  });
}
