export const repoRoot: string;
export function findPostgresBin(): string | null;
export function ensurePostgresInstalled(): string;
export function clusterDir(name: string): string;
export function startCluster(options: {
  name: string;
  port: number;
  database: string;
  throwaway?: boolean;
  /** The environment variable that moves this cluster's port, named when the port is taken. */
  portVariable?: string;
}): Promise<{ url: string; dataDir: string; stop: () => void }>;
export function stopCluster(name: string): void;
export function destroyCluster(name: string): void;
