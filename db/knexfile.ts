// The Knex command line's configuration: DATABASE_URL, else the project-local cluster's app database.
import { databaseUrl } from '../scripts/lib/paths.mjs'
import { knexConfig } from './knex-config'

export { knexConfig }
export default knexConfig(databaseUrl())
