import { isApiError } from '@/lib/api-client';
import { describeError } from '@/lib/error-messages';

/** What to tell the member when the server refused a move; the card is already back in place. */
export function moveErrorMessage(error: unknown, jobTitle: string): string {
  const code = isApiError(error) ? error.code : undefined;
  switch (code) {
    case 'version_conflict':
      return 'Someone changed this job a moment ago; the board now shows the latest.';
    case 'forbidden':
      return `Only the owner and foreman can move jobs, so ${jobTitle} stayed where it was.`;
    case 'not_found':
      return `${jobTitle} or its stage is no longer on the board; the board now shows the latest.`;
    case 'validation_failed':
      return `That place is no longer free for ${jobTitle} (the stage may have been archived or changed); the board now shows the latest.`;
    case 'conflict':
      return `${jobTitle} is no longer open, so it cannot be moved; the board now shows the latest.`;
    case 'network_error':
      return `Keybed could not be reached, so ${jobTitle} was not moved. Check your connection and try again.`;
    default: {
      const { title, action } = describeError(error);
      return `${jobTitle} was not moved. ${title} ${action}`;
    }
  }
}
