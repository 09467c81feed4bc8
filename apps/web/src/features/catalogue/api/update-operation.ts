import { useMutation, useQueryClient } from '@tanstack/react-query';
import { CatalogueOperation, type UpdateCatalogueOperationInput } from '@keybed/shared';
import { api, errorDetail } from '@/lib/api-client';
import { catalogueKeys } from './keys';

interface UpdateOperationVariables {
  operationId: string;
  changes: UpdateCatalogueOperationInput;
}

export const updateOperation = ({ operationId, changes }: UpdateOperationVariables) =>
  api.patch(`/catalogue/${encodeURIComponent(operationId)}`, changes, CatalogueOperation);

/** The operation as it is now, sent with a 409 when the edit was based on an older version. */
export const conflictingOperation = (error: unknown) => errorDetail(error, 'current', CatalogueOperation);

export function useUpdateOperation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateOperation,
    meta: { handlesError: true },
    onSettled: () => queryClient.invalidateQueries({ queryKey: catalogueKeys.lists() }),
  });
}
