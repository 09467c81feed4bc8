import type { ReactNode } from 'react';
import type { Role } from '@keybed/shared';
import { ButtonLink } from '@/components/button';
import { EmptyState } from '@/components/empty-state';
import { paths } from '@/config/paths';
import { canRunBoard } from '@/lib/roles';

/** Pages that change the board's records are for the owner and foreman; others see why not. */
export function RunnersOnly({ role, what, children }: { role: Role; what: string; children: ReactNode }) {
  if (canRunBoard(role)) return <>{children}</>;
  return (
    <EmptyState title={`Only the owner and foreman ${what}`} action={<ButtonLink to={paths.board.build()} variant="secondary">Go to the board</ButtonLink>}>
      <p>Ask them if something needs changing.</p>
    </EmptyState>
  );
}
