// /api/plans endpoints: teachers' plans and the starter library, a student's assigned plans, and
// the plan item a drill view opens.
import type { Assignment } from '../contract/assignments'
import type {
  Plan,
  PlanAssignee,
  PlanCreateInput,
  PlanItemContext,
  PlanUpdateInput,
  StarterPlan,
} from '../contract/plans'
import { http } from './http'

export type { Assignment, Plan, PlanAssignee, PlanItemContext, StarterPlan }
export type { AssignedItem, RecordingSummary } from '../contract/assignments'
export type { TargetProgress } from '../contract/targets'

/** Plan bodies as the client sends them (defaults are filled in by the server). */
export type PlanBody = Omit<PlanUpdateInput, 'notes' | 'dueAt'> &
  Partial<Pick<PlanUpdateInput, 'notes' | 'dueAt'>>
export type NewPlanBody = PlanBody & Partial<Pick<PlanCreateInput, 'studentIds'>>

export const fetchPlanItem = (id: string) => http.get<PlanItemContext>(`/plans/items/${id}`)
export const fetchAssigned = () => http.get<{ assignments: Assignment[] }>('/plans/assigned')

export const listPlans = () => http.get<{ plans: Plan[] }>('/plans')
export const fetchStarters = () => http.get<{ starters: StarterPlan[] }>('/plans/starters')
export const createPlan = (body: NewPlanBody) => http.post<{ plan: Plan }>('/plans', body)
export const updatePlan = (id: string, body: PlanBody) =>
  http.put<{ plan: Plan }>(`/plans/${id}`, body)
export const deletePlan = (id: string) => http.delete<void>(`/plans/${id}`)
export const copyPlan = (id: string) => http.post<{ plan: Plan }>(`/plans/${id}/copy`)
export const assignPlan = (id: string, studentIds: string[]) =>
  http.post<{ plan: Plan }>(`/plans/${id}/assignments`, { studentIds })
export const unassignPlan = (id: string, studentId: string) =>
  http.delete<{ plan: Plan }>(`/plans/${id}/assignments/${studentId}`)
