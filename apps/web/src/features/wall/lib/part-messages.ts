import { z } from 'zod';
import type { WallPart } from '@keybed/shared';
import { errorDetail, isApiError } from '@/lib/api-client';
import { describeError } from '@/lib/error-messages';
import { quantityText } from './part-quantity';

/** What one logging of parts used is: so much of a part, to a task. */
export interface PartUse {
  task: { id: string; title: string };
  part: Pick<WallPart, 'id' | 'name' | 'unit'>;
  quantityMilli: number;
}

/** The submit button: "Log 1 set of Hammer set, grand, 88"; without a valid quantity, "Log Hammer set, grand, 88". */
export const logButtonText = (part: Pick<WallPart, 'name' | 'unit'>, quantityMilli: number | undefined) =>
  quantityMilli === undefined ? `Log ${part.name}` : `Log ${quantityText(quantityMilli, part.unit)} of ${part.name}`;

/** Said in the panel once the API has recorded it. */
export const loggedText = ({ task, part, quantityMilli }: PartUse) => `Logged ${quantityText(quantityMilli, part.unit)} of ${part.name} to ${task.title}.`;

/**
 * Refusals about who is asking (the PIN, the screen), not about the part: the panel goes back
 * to the PIN pad, or says the technician is locked, as it does for clock actions.
 */
const WHO_CODES = new Set(['pin_incorrect', 'pin_locked', 'pin_not_set', 'wall_pin_limit', 'wall_not_paired']);
export const isWhoRefusal = (error: unknown) => isApiError(error) && WHO_CODES.has(error.code);

const NOTHING = 'Nothing was logged.';
/** The API's own words as a sentence (its messages carry no full stop). */
const sentence = (text: string) => (/[.!?]$/.test(text.trim()) ? text.trim() : `${text.trim()}.`);
const OnHand = z.number().int();

/** Plain words for a refused logging of parts, by the API's error code; the technician's choices stay on screen. */
export function partRefusalText(error: unknown, part: Pick<WallPart, 'name' | 'unit'>): string {
  if (!isApiError(error)) return `Something went wrong. ${NOTHING} Try again.`;
  switch (error.code) {
    case 'insufficient_stock': {
      const onHand = errorDetail(error, 'onHandMilli', OnHand);
      if (onHand === undefined) return `Not enough ${part.name} in stock for that. ${NOTHING} Ask the foreman to record the delivery, then log it again.`;
      const left = onHand > 0 ? `${quantityText(onHand, part.unit)} of ${part.name} on hand` : `no ${part.name} on hand`;
      return `Not enough in stock: ${left}. ${NOTHING} Ask the foreman to record the delivery, then log it again.`;
    }
    case 'task_not_open':
      return `That task’s job is not active any more. ${NOTHING} Choose another task.`;
    case 'not_found':
      return `${sentence(error.message)} ${NOTHING} Close and try again.`;
    case 'validation_failed': {
      const first = Object.values(error.fields ?? {}).flat()[0];
      return `${sentence(first ?? error.message)} ${NOTHING}`;
    }
    case 'network_error':
      return `No network, so ${NOTHING.toLowerCase()} Try again when the network is back.`;
    default: {
      const { title, action } = describeError(error);
      return `${title} ${NOTHING} ${action}`;
    }
  }
}
