export const DEMO_PASSWORD: string;
export const DEMO_MEMBERS: ReadonlyArray<{ email: string; role: string }>;
