// Client-side form rules (the server validates again; these only save a round trip).
const EMAIL = /^[^\s@]+@[^\s@]+\.[^\s@]+$/

export type Rule = (value: string) => true | string

export const required =
  (label: string): Rule =>
  (v) =>
    (v ?? '').trim().length > 0 || `Enter ${label}.`

export const email: Rule = (v) => EMAIL.test((v ?? '').trim()) || 'Enter a valid e-mail address.'

export const minLength =
  (n: number): Rule =>
  (v) =>
    (v ?? '').length >= n || `Use at least ${n} characters.`

export const maxLength =
  (n: number): Rule =>
  (v) =>
    (v ?? '').length <= n || `Use at most ${n} characters.`

export const PASSWORD_RULES: Rule[] = [minLength(10), maxLength(200)]
