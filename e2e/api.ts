import { expect, request as playwrightRequest, type APIRequestContext } from '@playwright/test';
import { DEMO_PASSWORD } from './fixtures';

const baseURL = process.env.E2E_BASE_URL ?? 'http://localhost:3000';

/** An API client signed in as `email`, for seeding a journey's own data over HTTP. */
export async function apiAs(email: string, password = DEMO_PASSWORD): Promise<SeedApi> {
  const context = await playwrightRequest.newContext({ baseURL });
  const res = await context.post('/api/auth/sign-in', { data: { email, password } });
  expect(res.status(), `sign in as ${email}`).toBe(200);
  return new SeedApi(context);
}

export class SeedApi {
  constructor(readonly context: APIRequestContext) {}

  private async send<T>(method: 'get' | 'post' | 'patch', path: string, data?: unknown): Promise<T> {
    const res = await this.context[method](path, data === undefined ? {} : { data });
    expect(res.ok(), `${method.toUpperCase()} ${path} → ${res.status()} ${await res.text()}`).toBe(true);
    return (res.status() === 204 ? undefined : await res.json()) as T;
  }

  get = <T>(path: string) => this.send<T>('get', path);
  post = <T>(path: string, data: unknown) => this.send<T>('post', path, data);
  patch = <T>(path: string, data: unknown) => this.send<T>('patch', path, data);

  /** A stage of the journey's own (unique name), so parallel journeys never share a column. */
  createStage = (name: string) => this.post<{ id: string; name: string }>('/api/stages', { name });

  /** A client, their piano and a job on it in the given stage. */
  async createJob(title: string, stageId: string) {
    const client = await this.post<{ id: string }>('/api/clients', { name: `Client of ${title}` });
    const piano = await this.post<{ id: string }>('/api/pianos', { clientId: client.id, maker: 'Carrow & Finch', model: 'Salon', type: 'grand', sizeMm: 1778 });
    return this.post<{ id: string; title: string; version: number }>('/api/jobs', { pianoId: piano.id, title, stageId });
  }

  dispose = () => this.context.dispose();
}
