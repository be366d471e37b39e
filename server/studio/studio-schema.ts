// Studio shapes shared by the API and the client.
export interface StudioStudent {
  id: string
  name: string
  email: string
  studioId: string
  studioName: string
  joinedAt: string
  lastPracticeAt: string | null
  accuracy: number | null
}
