import { Button } from '@/components/button';
import { showToast } from '@/lib/toast';
import { useAddTemplateTasks } from '../api/add-template-tasks';
import { useTaskTemplate } from '../api/get-task-template';

interface TemplateButtonProps {
  jobId: string;
  stage: { id: string; name: string };
}

/** "Add the Hammers tasks": the stage template's tasks in one action; ones the job has are skipped. */
export function TemplateButton({ jobId, stage }: TemplateButtonProps) {
  const template = useTaskTemplate(stage.id);
  const add = useAddTemplateTasks(jobId);
  const count = template.data?.items.length ?? 0;
  if (count === 0) return null;

  function addAll() {
    add.mutate(stage.id, {
      onSuccess: ({ tasks, skippedTitles }) => {
        const added = tasks.length === 0 ? `The job already has every ${stage.name} task.` : `Added ${tasks.length} ${stage.name} ${tasks.length === 1 ? 'task' : 'tasks'}.`;
        const skipped = tasks.length > 0 && skippedTitles.length > 0 ? ` Already there: ${skippedTitles.join(', ')}.` : '';
        showToast(tasks.length === 0 ? 'info' : 'success', added + skipped);
      },
    });
  }

  return (
    <Button variant="secondary" onClick={addAll} isPending={add.isPending}>
      Add the {stage.name} tasks
    </Button>
  );
}
