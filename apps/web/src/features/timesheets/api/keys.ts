/** Query keys for timesheets: one technician's week per detail. */
export interface WeekKey {
  /** Absent for the signed-in member's own week. */
  technicianId?: string | undefined;
  weekStart: string;
}

export const timesheetKeys = {
  all: ['timesheets'] as const,
  details: () => [...timesheetKeys.all, 'week'] as const,
  detail: (week: WeekKey) => [...timesheetKeys.details(), { technicianId: week.technicianId ?? null, weekStart: week.weekStart }] as const,
};
