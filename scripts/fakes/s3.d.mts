export function ensureObjectStore(
  dataDir: string,
  env?: NodeJS.ProcessEnv,
): Promise<{ env: NodeJS.ProcessEnv; close: () => Promise<void> }>
