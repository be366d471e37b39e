export function findArchive(wanted: string, database: string): string
export function restore(argv: string[]): Promise<boolean>
