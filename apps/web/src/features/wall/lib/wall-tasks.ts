import type { WallTask } from '@keybed/shared';

const words = (text: string) => text.toLowerCase().split(/\s+/).filter(Boolean);

/** Tasks whose title, job, client, piano or stage hold every word searched for. */
export function matchTasks(tasks: readonly WallTask[], query: string): WallTask[] {
  const wanted = words(query);
  if (wanted.length === 0) return [...tasks];
  return tasks.filter((task) => {
    const text = [task.title, task.job.title, task.job.clientName, task.job.pianoLabel, task.stage?.name ?? ''].join(' ').toLowerCase();
    return wanted.every((word) => text.includes(word));
  });
}

export interface JobGroup {
  job: WallTask['job'];
  tasks: WallTask[];
}

/** The technician's own tasks first, then every other open task grouped by job, in the API's order. */
export function groupTasks(tasks: readonly WallTask[]): { assigned: WallTask[]; others: JobGroup[] } {
  const others = new Map<string, JobGroup>();
  for (const task of tasks) {
    if (task.isAssigned) continue;
    const group = others.get(task.job.id) ?? { job: task.job, tasks: [] };
    group.tasks.push(task);
    others.set(task.job.id, group);
  }
  return { assigned: tasks.filter((t) => t.isAssigned), others: [...others.values()] };
}
