// The notation component, loaded only when shown (it brings VexFlow): use NotationStaffAsync.
import { defineAsyncComponent } from 'vue'

export const NotationStaffAsync = defineAsyncComponent(() => import('./NotationStaff.vue'))
export { notationModel, clefFor, keySignatureName } from './notation-model'
export type { NotationModel, PitchView, StaffEvent, StaffMeasure } from './notation-model'
