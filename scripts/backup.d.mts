export function backup(argv?: string[]): Promise<string>
