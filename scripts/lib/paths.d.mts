export const ROOT: string
export const DATA_DIR: string
export const PG_HOST: string
export const PG_PORT: number
export const PG_USER: string
export const APP_DATABASE: string
export const TEST_API_DATABASE: string
export const TEST_E2E_DATABASE: string
export const TEST_OUTPUT_DIR: string
export function localSecret(name: string): string
export function databaseUrl(database?: string): string
