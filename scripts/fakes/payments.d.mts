export interface FakePaymentEvent {
  id: string;
  deliveries: string[];
  lastStatus: number | null;
  body: { id: string; type: string; data: { object: Record<string, unknown> } };
}

export interface FakePayments {
  url: string;
  host: string;
  port: number;
  sessions: Map<string, Record<string, unknown> & { id: string; url: string; amount_total: number; currency: string; status: string }>;
  events: FakePaymentEvent[];
  setWebhookUrl(url: string): void;
  stop(): Promise<void>;
}

export function startFakePayments(options?: { port?: number; webhookUrl?: string; webhookSecret: string; apiKey?: string }): Promise<FakePayments>;
export function signature(payload: string, secret: string, timestamp?: number): string;
