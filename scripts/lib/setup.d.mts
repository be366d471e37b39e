export function ensureDependencies(): Promise<void>
export function prepareDatabase(database: string, options?: { seed?: boolean }): Promise<void>
export function ensureClientBuild(outDir?: string): Promise<void>
