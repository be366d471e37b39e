// Password hashing with bcryptjs (cost from configuration, at least 12).
import bcrypt from 'bcryptjs'

export const hashPassword = (password: string, cost: number) => bcrypt.hash(password, cost)
export const verifyPassword = (password: string, hash: string) => bcrypt.compare(password, hash)

// Compared against when the e-mail is unknown, so sign-in takes as long either way.
export const UNKNOWN_USER_HASH = '$2b$12$lT4e6T5XL8f7xzMHNIUEX.43jCx2m6mIYGoKIEwidEp1crzwRcuy6'
