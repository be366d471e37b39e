// A plan being edited in the browser: conversion from a saved plan or a starter, checks before it
// is sent (the shared zod schemas), and the body the API takes.
import { DrillPresetSchema, type DrillPreset } from '../contract/drills'
import { PracticeTargetSchema, type PracticeTarget } from '../contract/targets'
import { defaultPreset } from './preset-fields'

export interface DraftItem {
  /** Stable key for the list; the saved item's id when it has one. */
  key: string
  id?: string
  preset: DrillPreset
  target: PracticeTarget
}

export interface PlanDraft {
  title: string
  notes: string
  /** yyyy-mm-dd in the teacher's time zone, or '' for no due date. */
  dueDate: string
  items: DraftItem[]
  studentIds: string[]
}

interface PlanLike {
  title: string
  notes: string
  dueAt?: string | null
  items: { id?: string; preset: DrillPreset; target: PracticeTarget }[]
  assignees?: { studentId: string }[]
}

let keys = 0
const nextKey = () => `item-${(keys += 1)}`

export const newItem = (): DraftItem => ({
  key: nextKey(),
  preset: defaultPreset('recall'),
  target: PracticeTargetSchema.parse({ kind: 'accuracy' }),
})

/** yyyy-mm-dd of an instant in the local time zone. */
export function localDate(iso: string): string {
  const d = new Date(iso)
  const pad = (n: number) => String(n).padStart(2, '0')
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}`
}

/**
 * A warning (not an error) for a due date before today: the plan would be overdue the moment it
 * is assigned. Empty when the date is today, later or unset.
 */
export function dueDateWarning(dueDate: string, now = new Date()): string {
  if (!dueDate || dueDate >= localDate(now.toISOString())) return ''
  return 'This date has passed: the plan will show as overdue at once.'
}

export function draftFrom(plan: PlanLike | null): PlanDraft {
  if (!plan) return { title: '', notes: '', dueDate: '', items: [newItem()], studentIds: [] }
  return {
    title: plan.title,
    notes: plan.notes,
    dueDate: plan.dueAt ? localDate(plan.dueAt) : '',
    items: plan.items.map((item) => ({
      key: item.id ?? nextKey(),
      id: item.id,
      preset: item.preset,
      target: item.target,
    })),
    studentIds: (plan.assignees ?? []).map((a) => a.studentId),
  }
}

/** Field errors keyed like the server's ("items.0.preset.settings.high"); empty when the draft is fine. */
export function draftErrors(draft: PlanDraft): Record<string, string[]> {
  const errors: Record<string, string[]> = {}
  const add = (key: string, message: string) => (errors[key] ??= []).push(message)
  if (!draft.title.trim()) add('title', 'Give the plan a title.')
  draft.items.forEach((item, i) => {
    for (const [part, result] of [
      ['preset', DrillPresetSchema.safeParse(item.preset)],
      ['target', PracticeTargetSchema.safeParse(item.target)],
    ] as const) {
      if (!result.success)
        for (const issue of result.error.issues)
          add([`items.${i}.${part}`, ...issue.path.map(String)].join('.'), issue.message)
    }
  })
  return errors
}

/** The due date as the end of that day in the teacher's time zone. */
export const dueAtOf = (dueDate: string) =>
  dueDate ? new Date(`${dueDate}T23:59:00`).toISOString() : null

export function planBodyOf(draft: PlanDraft) {
  return {
    title: draft.title.trim(),
    notes: draft.notes.trim(),
    dueAt: dueAtOf(draft.dueDate),
    items: draft.items.map(({ id, preset, target }) => ({ ...(id ? { id } : {}), preset, target })),
  }
}
