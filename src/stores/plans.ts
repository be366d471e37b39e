// A teacher's practice plans and the starter library.
import { defineStore } from 'pinia'
import { ref } from 'vue'
import * as plansApi from '../api/plans'
import { useLoadState } from './load-state'

export const usePlansStore = defineStore('plans', () => {
  const { isLoading, error, load } = useLoadState()
  const plans = ref<plansApi.Plan[]>([])
  const starters = ref<plansApi.StarterPlan[]>([])

  function keep(plan: plansApi.Plan) {
    plans.value = [plan, ...plans.value.filter((p) => p.id !== plan.id)]
    return plan
  }

  // Actions throw on failure, so the form that called them can show the fields.
  return {
    plans,
    starters,
    isLoading,
    error,
    loadPlans: () => load(async () => void (plans.value = (await plansApi.listPlans()).plans)),
    loadStarters: () =>
      load(async () => void (starters.value = (await plansApi.fetchStarters()).starters)),
    savePlan: async (id: string | null, body: plansApi.NewPlanBody) =>
      keep((id ? await plansApi.updatePlan(id, body) : await plansApi.createPlan(body)).plan),
    copyPlan: async (id: string) => keep((await plansApi.copyPlan(id)).plan),
    assignPlan: async (id: string, studentIds: string[]) =>
      keep((await plansApi.assignPlan(id, studentIds)).plan),
    unassignPlan: async (id: string, studentId: string) =>
      keep((await plansApi.unassignPlan(id, studentId)).plan),
    async deletePlan(id: string) {
      await plansApi.deletePlan(id)
      plans.value = plans.value.filter((p) => p.id !== id)
    },
  }
})
