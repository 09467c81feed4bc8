import type { Member } from '@keybed/shared';
import { MemberRow } from './member-row';

interface MembersTableProps {
  members: Member[];
  /** The signed-in person's user id, to mark their own row. */
  currentUserId: string;
  onMemberUpdated?: (member: Member) => void;
}

const headCell = 'px-0 py-2 pr-4 text-left text-sm font-semibold text-graphite-600';

/** A table on wider screens; each row becomes a card on a phone. */
export function MembersTable({ members, currentUserId, onMemberUpdated }: MembersTableProps) {
  return (
    <div className="md:overflow-hidden md:rounded-lg md:border md:border-graphite-300 md:bg-white">
      <table className="block w-full md:table">
        <caption className="sr-only">Workshop members</caption>
        <thead className="sr-only md:not-sr-only md:table-header-group">
          <tr>
            <th scope="col" className={`${headCell} md:pl-4`}>Name</th>
            <th scope="col" className={headCell}>Role</th>
            <th scope="col" className={headCell}>Status</th>
            <th scope="col" className={headCell}>Joined</th>
            <th scope="col" className={headCell}>
              <span className="sr-only">Actions</span>
            </th>
          </tr>
        </thead>
        <tbody className="flex flex-col gap-3 md:table-row-group">
          {members.map((member) => (
            <MemberRow
              key={member.id}
              member={member}
              isYou={member.userId === currentUserId}
              onUpdated={onMemberUpdated}
            />
          ))}
        </tbody>
      </table>
    </div>
  );
}
