/** Query keys for the auth feature. The signed-in member is one record; invitation previews are looked up by token. */
export const authKeys = {
  all: ['auth'] as const,
  me: () => [...authKeys.all, 'me'] as const,
  details: () => [...authKeys.all, 'invitation-preview'] as const,
  detail: (token: string) => [...authKeys.details(), token] as const,
};
