// /api/studio endpoints.
import type { StudioStudent } from '../../server/studio/studio-schema'
import { http } from './http'

export type { StudioStudent }

export const listStudents = () => http.get<{ students: StudioStudent[] }>('/studio/students')
