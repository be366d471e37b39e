export const IS_ROOT: boolean
export const SHARED_HOME: string
export function postgresIds(): { uid: number; gid: number }
export function ensureDataDir(): string
export function checkoutKey(dataDir?: string): string
export function clusterHome(): { home: string; cluster: string; logFile: string; shared: boolean }
export function prepareSharedHome(home: string): void
export function folderBlockingPostgres(dir: string): string | null
