export interface Cluster {
  bin: string;
  data: string;
  port: number;
  url(database: string): string;
  stop(): Promise<void>;
  createDatabase(database: string, options?: { recreate?: boolean }): Promise<void>;
}
export const DB_USER: string;
export function clusterBase(root: string): string;
export function ensurePostgresBinaries(): Promise<string>;
export function startCluster(options: { root: string; name: string; preferredPort: number; fresh?: boolean; fast?: boolean }): Promise<Cluster>;
