import type { SendReport } from './clock-queue';

/** What the home view says after a technician's context closes. */
export interface WallNotice {
  tone: 'done' | 'saved' | 'problem';
  text: string;
}

const firstName = (name: string) => name.split(/\s+/)[0] ?? name;

/** Said when an action is kept on the screen: with a grant it goes by itself; without, it waits for the PIN. */
export const savedText = (name: string, what: string, hasGrant: boolean) =>
  hasGrant
    ? `Saved on this screen: ${what} It will be sent by itself when the network is back.`
    : `Saved on this screen: ${what} It will be sent the next time ${firstName(name)} enters a PIN here with the network back.`;

/** Said on the home view after the screen sent waiting actions by itself. */
export function sentByItselfText(report: SendReport): string | undefined {
  const parts: string[] = [];
  if (report.sent.length > 0) {
    const what = report.sent.map((a) => `${firstName(a.technician.name)} ${a.kind === 'clock-on' ? `on ${a.task?.title ?? 'a task'}` : 'clocked off'}`);
    parts.push(`Sent now the network is back: ${what.join(', ')}.`);
  }
  for (const refused of report.refused) parts.push(`Not accepted for ${firstName(refused.technician.name)}: ${refused.refusal?.message ?? 'refused'}`);
  return parts.length > 0 ? parts.join(' ') : undefined;
}

/** One line on what happened to actions that were waiting on this screen, or undefined if there were none. */
export function waitingReportText(report: SendReport): string | undefined {
  const parts: string[] = [];
  if (report.sent.length > 0) parts.push(`${report.sent.length === 1 ? '1 waiting action' : `${report.sent.length} waiting actions`} sent.`);
  for (const refused of report.refused) parts.push(`Not accepted: ${refused.refusal?.message ?? 'refused'}`);
  if (report.left.length > 0) parts.push(`${report.left.length === 1 ? '1 action is' : `${report.left.length} actions are`} still waiting.`);
  return parts.length > 0 ? parts.join(' ') : undefined;
}
