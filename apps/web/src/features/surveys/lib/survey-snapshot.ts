import { Survey } from '@keybed/shared';
import { openSurveyDatabase } from './draft-store';

const SNAPSHOTS = 'snapshots';

/**
 * The last copy of a survey this device read, so a reload without a connection still opens it
 * (with the answers kept as drafts on top). Best effort: a refusal only means no offline copy.
 */
export async function keepSurveySnapshot(survey: Survey): Promise<void> {
  try {
    const db = await openSurveyDatabase();
    db.transaction(SNAPSHOTS, 'readwrite').objectStore(SNAPSHOTS).put({ id: survey.id, survey });
  } catch {
    // No offline copy on this device; the survey still works online.
  }
}

export async function readSurveySnapshot(id: string): Promise<Survey | null> {
  try {
    const db = await openSurveyDatabase();
    const row = await new Promise<unknown>((resolve, reject) => {
      const request = db.transaction(SNAPSHOTS, 'readonly').objectStore(SNAPSHOTS).get(id);
      request.onsuccess = () => resolve(request.result);
      request.onerror = () => reject(request.error ?? new Error('IndexedDB request failed'));
    });
    const parsed = Survey.safeParse((row as { survey?: unknown } | undefined)?.survey);
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}
