import { test as base, expect, type APIRequestContext } from '@playwright/test';

export const DEMO_PASSWORD = 'keybed-demo';
export const DEMO = {
  owner: 'margaret@fennick.example',
  foreman: 'tom@fennick.example',
  technician: 'priya@fennick.example',
} as const;

const inboxUrl = process.env.E2E_INBOX_URL ?? 'http://127.0.0.1:1080';

interface InboxMessage {
  subject: string;
  text: string;
  to: Array<{ address: string }>;
}

/** Reads the fake mail server's inbox over its HTTP API until a message to `address` arrives. */
export async function waitForMail(request: APIRequestContext, address: string): Promise<InboxMessage> {
  let found: InboxMessage | undefined;
  await expect
    .poll(
      async () => {
        const messages = (await (await request.get(`${inboxUrl}/api/email`)).json()) as InboxMessage[];
        found = messages.filter((m) => m.to.some((t) => t.address === address)).at(-1);
        return Boolean(found);
      },
      { message: `an e-mail to ${address}`, timeout: 10_000 },
    )
    .toBe(true);
  return found!;
}

export function linkIn(message: InboxMessage, kind: 'invitations' | 'reset-password'): string {
  const match = new RegExp(`https?://[^\\s]+/${kind}/[A-Za-z0-9_-]+`).exec(message.text);
  if (!match) throw new Error(`No ${kind} link in the e-mail`);
  return new URL(match[0]).pathname;
}

export const uniqueEmail = (label: string) => `${label}-${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}@fennick-test.example`;

export const test = base;
export { expect };
