import { useEffect, useMemo, useRef, useState, useSyncExternalStore } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import type { Survey } from '@keybed/shared';
import { ApiError } from '@/lib/api-client';
import type { PreferredLengthUnit } from '@/lib/length-unit';
import { cacheComponent, conflictingComponent, putSurveyComponent } from '../api/put-survey-component';
import { cacheSurvey, conflictingSurvey, updateSurvey } from '../api/update-survey';
import { ComponentAnswer, answerOf, isSameAnswer, toWire } from '../lib/component-answer';
import { openDraftStore } from '../lib/draft-store';
import { SaveQueue, type QueueSummary } from '../lib/save-queue';
import { SurveyAnswer, isSameSurveyAnswer, surveyAnswerOf, toSurveyWire } from '../lib/survey-answer';

export interface SurveySaving {
  components: SaveQueue<ComponentAnswer>;
  /** The survey's own fields (particulars and summary), under the one key {@link SURVEY_KEY}. */
  fields: SaveQueue<SurveyAnswer>;
}

export const SURVEY_KEY = 'survey';

const notSendable = () => new ApiError({ status: 400, code: 'validation_failed', message: 'Some details need fixing' });

/** Both queues for one survey, ready once the drafts this device kept have been read back. */
export function useSurveySaving(survey: Survey | undefined, unit: PreferredLengthUnit): SurveySaving | null {
  const queryClient = useQueryClient();
  const [saving, setSaving] = useState<SurveySaving | null>(null);
  // The survey as first read: the queues start from it once per survey, not on every refetch.
  const first = useRef(survey);
  if (survey && first.current?.id !== survey.id) first.current = survey;
  const surveyId = survey?.id;

  useEffect(() => {
    const initial = first.current;
    if (!surveyId || !initial) return;
    let created: SurveySaving | null = null;
    let isCancelled = false;
    const components = initial.areas.flatMap((a) => a.components);
    const measureOf = new Map(components.map((c) => [c.id, c.measure]));

    void (async () => {
      const [componentStore, fieldStore] = await Promise.all([openDraftStore(ComponentAnswer), openDraftStore(SurveyAnswer)]);
      const componentQueue = new SaveQueue<ComponentAnswer>({
        scope: `${surveyId}:components`,
        store: componentStore,
        adapter: {
          check: (key, answer) => {
            const wire = toWire(answer, measureOf.get(key) ?? null);
            return wire.ok ? null : wire.fields;
          },
          isSame: (key, a, b) => isSameAnswer(a, b, measureOf.get(key) ?? null),
          async send(key, answer, baseVersion) {
            const wire = toWire(answer, measureOf.get(key) ?? null);
            if (!wire.ok) throw notSendable();
            try {
              const saved = await putSurveyComponent(surveyId, key, wire.wire, baseVersion);
              cacheComponent(queryClient, surveyId, saved);
              return { version: saved.version, answer: answerOf(saved) };
            } catch (error) {
              const theirs = conflictingComponent(error);
              if (theirs) cacheComponent(queryClient, surveyId, theirs);
              throw error;
            }
          },
          conflictOf: (_key, error) => {
            const theirs = conflictingComponent(error);
            return theirs && { version: theirs.version, answer: answerOf(theirs) };
          },
        },
      });
      const fieldQueue = new SaveQueue<SurveyAnswer>({
        scope: `${surveyId}:survey`,
        store: fieldStore,
        debounceMs: 900,
        adapter: {
          check: (_key, answer) => {
            const wire = toSurveyWire(answer, unit);
            return wire.ok ? null : wire.fields;
          },
          isSame: (_key, a, b) => isSameSurveyAnswer(a, b, unit),
          async send(_key, answer, baseVersion) {
            const wire = toSurveyWire(answer, unit);
            if (!wire.ok) throw notSendable();
            const saved = await updateSurvey(surveyId, wire.wire, baseVersion);
            cacheSurvey(queryClient, saved);
            return { version: saved.version, answer: surveyAnswerOf(saved, unit) };
          },
          conflictOf: (_key, error) => {
            const theirs = conflictingSurvey(error);
            return theirs && { version: theirs.version, answer: surveyAnswerOf(theirs, unit) };
          },
        },
      });
      await Promise.all([
        componentQueue.start(components.map((c) => ({ key: c.id, saved: { version: c.version, answer: answerOf(c) } }))),
        fieldQueue.start([{ key: SURVEY_KEY, saved: { version: initial.version, answer: surveyAnswerOf(initial, unit) } }]),
      ]);
      created = { components: componentQueue, fields: fieldQueue };
      if (isCancelled) return void disposeAll(created);
      setSaving(created);
    })();

    const retry = () => created && (created.components.retryNow(), created.fields.retryNow());
    window.addEventListener('online', retry);
    return () => {
      isCancelled = true;
      window.removeEventListener('online', retry);
      if (created) disposeAll(created);
      setSaving(null);
    };
    // The queues live as long as the survey's page; the unit is read once when they start.
  }, [surveyId, queryClient]);

  // A fresh read of the survey (another device saved) reaches answers nobody is editing here.
  useEffect(() => {
    if (!saving || !survey) return;
    for (const c of survey.areas.flatMap((a) => a.components)) saving.components.refresh(c.id, { version: c.version, answer: answerOf(c) });
    saving.fields.refresh(SURVEY_KEY, { version: survey.version, answer: surveyAnswerOf(survey, unit) });
  }, [saving, survey, unit]);

  return saving;
}

function disposeAll(saving: SurveySaving) {
  saving.components.dispose();
  saving.fields.dispose();
}

export function useQueueEntry<A>(queue: SaveQueue<A>, key: string) {
  return useSyncExternalStore(queue.subscribe, () => queue.entry(key));
}

/** Every entry's current answer, read again only when the queue changes. */
export function useQueueAnswers<A>(queue: SaveQueue<A>, keys: readonly string[]): A[] {
  const revision = useSyncExternalStore(queue.subscribe, () => queue.revision);
  return useMemo(() => keys.flatMap((key) => { const e = queue.entry(key); return e ? [e.answer] : []; }), [queue, keys, revision]);
}

export function useQueueSummary<A>(queue: SaveQueue<A>): QueueSummary {
  return useSyncExternalStore(queue.subscribe, () => queue.summary());
}
