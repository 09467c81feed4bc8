import { useMemo } from 'react';
import type { Survey } from '@keybed/shared';
import { LoadingRegion, Skeleton } from '@/components/skeleton';
import type { PreferredLengthUnit } from '@/lib/length-unit';
import { useQueueAnswers, useSurveySaving } from '../hooks/use-survey-saving';
import { AreaNav, areaAnchor } from './area-nav';
import { ComponentCard } from './component-card';
import { ParticularsFields, type Person } from './particulars-section';
import { SavingBanner } from './saving-banner';
import { SummaryFields } from './summary-fields';
import { SurveyFieldsSection } from './survey-fields-section';

interface SurveyScreenProps {
  survey: Survey;
  people: readonly Person[];
  /** Owner and foreman: choose the photos the client sees. */
  canShare: boolean;
  unit: PreferredLengthUnit;
  isOfflineCopy: boolean;
}

/** The survey on a tablet: particulars, every component by area, and the summary, all saved as you go. */
export function SurveyScreen({ survey, people, canShare, unit, isOfflineCopy }: SurveyScreenProps) {
  const saving = useSurveySaving(survey, unit);
  const componentIds = useMemo(() => survey.areas.flatMap((a) => a.components.map((c) => c.id)), [survey.areas]);

  if (!saving) {
    return (
      <LoadingRegion label="Opening the survey and any answers kept on this device">
        <Skeleton className="h-24 w-full" />
        <Skeleton className="mt-4 h-96 w-full" />
      </LoadingRegion>
    );
  }
  return (
    <div className="space-y-4">
      <SavingBanner saving={saving} isOfflineCopy={isOfflineCopy} />
      <div className="grid gap-6 lg:grid-cols-[13rem_1fr]">
        <AreaNavFor saving={saving} survey={survey} componentIds={componentIds} />
        <div className="min-w-0 space-y-6">
          <SurveyFieldsSection id="particulars" title="Particulars" saving={saving} unit={unit}>
            {({ answer, fields, onChange }) => <ParticularsFields answer={answer} people={people} unit={unit} fields={fields} onChange={onChange} />}
          </SurveyFieldsSection>
          {survey.areas.map((area, i) => (
            // A plain block, not a landmark: an area may share its name with a component (Regulation, Woodworm).
            <div key={area.area} id={areaAnchor(i)} className="scroll-mt-4 space-y-3">
              <h2 className="text-xl font-bold">{area.area}</h2>
              {area.components.map((component) => (
                <ComponentCard key={component.id} surveyId={survey.id} component={component} queue={saving.components} canShare={canShare} />
              ))}
            </div>
          ))}
          <SummarySection saving={saving} unit={unit} componentIds={componentIds} />
        </div>
      </div>
    </div>
  );
}

function AreaNavFor({ saving, survey, componentIds }: { saving: NonNullable<ReturnType<typeof useSurveySaving>>; survey: Survey; componentIds: string[] }) {
  const answers = useQueueAnswers(saving.components, componentIds);
  const byId = new Map(componentIds.map((id, i) => [id, answers[i]]));
  return <AreaNav areas={survey.areas} answerOf={(id) => byId.get(id)} />;
}

function SummarySection({ saving, unit, componentIds }: { saving: NonNullable<ReturnType<typeof useSurveySaving>>; unit: PreferredLengthUnit; componentIds: string[] }) {
  const answers = useQueueAnswers(saving.components, componentIds);
  return (
    <SurveyFieldsSection id="summary" title="Summary" saving={saving} unit={unit}>
      {({ answer, fields, onChange }) => <SummaryFields answer={answer} componentAnswers={answers} fields={fields} onChange={onChange} />}
    </SurveyFieldsSection>
  );
}
