export const CLUSTER_DIR: string
export function ensureInstalled(): string
export function startCluster(): Promise<boolean>
export function stopCluster(): void
export function createDatabase(name: string): Promise<boolean>
export function dropDatabase(name: string): Promise<void>
