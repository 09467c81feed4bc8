export interface Mailbox {
  smtpPort: number;
  inboxUrl: string;
  stop(): Promise<void>;
}
export function startMailbox(options: { root: string; smtpPort?: number; webPort?: number; logFile?: string }): Promise<Mailbox>;
