// Downloads of an exercise: MusicXML and MIDI made in the browser (the writers load on first use),
// a worksheet PDF from the server.
import { fetchWorksheet } from '../api/worksheets'
import { downloadBlob } from '../components/fretboard/board-export'
import type { Exercise } from '../exchange'
import type { SheetRequest } from './drill-paper'

export type ExerciseFormat = 'musicxml' | 'midi'

export async function downloadExercise(exercise: Exercise, format: ExerciseFormat): Promise<void> {
  const { exerciseFileName, toMidi, toMusicXml } = await import('../exchange')
  const data =
    format === 'musicxml'
      ? new Blob([toMusicXml(exercise)], { type: 'application/vnd.recordare.musicxml+xml' })
      : new Blob([toMidi(exercise) as Uint8Array<ArrayBuffer>], { type: 'audio/midi' })
  downloadBlob(data, exerciseFileName(exercise, format === 'musicxml' ? 'musicxml' : 'mid'))
}

/** Fetches the sheet's PDF; a 400 comes back as ApiError with its field errors. */
export async function downloadSheet(sheet: SheetRequest): Promise<void> {
  const pdf = await fetchWorksheet(sheet.kind, sheet.params)
  downloadBlob(pdf, `${sheet.kind}-worksheet.pdf`)
}
