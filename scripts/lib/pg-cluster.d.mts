// Types for pg-cluster.mjs (imported by TypeScript test setup).
export interface ClusterConnection {
  host: string;
  port: number;
  user: string;
  password: string;
  url(db: string): string;
}
export const DEFAULT_PORT: number;
export const SUPERUSER: string;
export function clusterPort(): number;
export function findServerBin(): string | null;
export function ensureCluster(options?: { quiet?: boolean }): ClusterConnection;
export function runningCluster(): ClusterConnection | null;
export function stopCluster(): boolean;
export function databaseUrlFor(db: string, options?: { start?: boolean }): string | null;
export function withDatabase(url: string, db: string): string;
export function databaseName(url: string): string;
export function redact(url: string): string;
