import type { SendReport } from './clock-queue';

/** What the home view says after a technician's context closes. */
export interface WallNotice {
  tone: 'done' | 'saved' | 'problem';
  text: string;
}

const firstName = (name: string) => name.split(/\s+/)[0] ?? name;

export const savedText = (name: string, what: string) =>
  `Saved on this screen: ${what} It will be sent the next time ${firstName(name)} enters a PIN here with the network back.`;

/** One line on what happened to actions that were waiting on this screen, or undefined if there were none. */
export function waitingReportText(report: SendReport): string | undefined {
  const parts: string[] = [];
  if (report.sent.length > 0) parts.push(`${report.sent.length === 1 ? '1 waiting action' : `${report.sent.length} waiting actions`} sent.`);
  for (const refused of report.refused) parts.push(`Not accepted: ${refused.refusal?.message ?? 'refused'}`);
  if (report.left.length > 0) parts.push(`${report.left.length === 1 ? '1 action is' : `${report.left.length} actions are`} still waiting.`);
  return parts.length > 0 ? parts.join(' ') : undefined;
}
