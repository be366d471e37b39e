export function clusterLocation(): {
  home: string
  cluster: string
  logFile: string
  shared: boolean
}
export function startCluster(): Promise<boolean>
export function stopCluster(): void
export function destroyCluster(): void
export function createDatabase(name: string): Promise<boolean>
export function dropDatabase(name: string): Promise<void>
export function renameDatabase(from: string, to: string): Promise<void>
export function databaseExists(name: string): Promise<boolean>
