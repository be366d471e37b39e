// /api/instruments endpoints.
import type {
  Instrument,
  InstrumentInput,
  InstrumentPatch,
  InstrumentPreset,
} from '../contract/instruments'
import { http } from './http'

export type { Instrument, InstrumentInput, InstrumentPatch, InstrumentPreset }

/** What POST accepts: the fields with server defaults may be left out. */
export type NewInstrument = Pick<InstrumentInput, 'name' | 'tuning' | 'frets' | 'scaleLengthMm'> &
  Partial<InstrumentInput>

export const listInstruments = () => http.get<{ instruments: Instrument[] }>('/instruments')
export const listPresets = () => http.get<{ presets: InstrumentPreset[] }>('/instruments/presets')
export const createInstrument = (body: NewInstrument) =>
  http.post<{ instrument: Instrument }>('/instruments', body)
export const updateInstrument = (id: string, patch: InstrumentPatch) =>
  http.patch<{ instrument: Instrument }>(`/instruments/${encodeURIComponent(id)}`, patch)
export const deleteInstrument = (id: string) =>
  http.delete<void>(`/instruments/${encodeURIComponent(id)}`)
export const activateInstrument = (id: string) =>
  http.post<{ instrument: Instrument }>(`/instruments/${encodeURIComponent(id)}/activate`)
