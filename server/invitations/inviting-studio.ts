// What an invitation and an invite link both carry: the studio they open and the teacher who runs it.

/** The studio and teacher columns both invitation queries select. */
export interface InvitingStudioRow {
  studio_id: string
  studio_name: string
  teacher_id: string
  teacher_name: string
}

/** The same four facts as the records name them. */
export const invitingStudio = (row: InvitingStudioRow) => ({
  studioId: row.studio_id,
  studioName: row.studio_name,
  teacherId: row.teacher_id,
  teacherName: row.teacher_name,
})
