// The fictional Cedar Hollow Music Collective: people, instruments and studio of the demo.
export const DEMO_PASSWORD = 'ambitus-demo'
export const DEMO_STUDIO = 'Cedar Hollow Music Collective'

export interface DemoInstrument {
  name: string
  presetId: string
  tuning: number[]
  frets: number
  scaleLengthMm: number
  handedness: 'right' | 'left'
  accidentals: 'sharp' | 'flat'
}

export interface DemoPerson {
  email: string
  name: string
  role: 'student' | 'teacher' | 'admin'
  about: string
  instrument?: DemoInstrument
  /** Days at the end of the seeded history without practice (so the roster has someone to flag). */
  restDays?: number
}

const BASS_4 = [28, 33, 38, 43] // E1 A1 D2 G2
const BASS_5 = [23, 28, 33, 38, 43] // B0 E1 A1 D2 G2
const GUITAR_6 = [40, 45, 50, 55, 59, 64] // E2 A2 D3 G3 B3 E4
const BASS_4_DROP_D = [26, 33, 38, 43] // D1 A1 D2 G2

export const DEMO_PEOPLE: DemoPerson[] = [
  {
    email: 'teacher@cedarhollow.test',
    name: 'Marta Ilves',
    role: 'teacher',
    about: 'bass and guitar teacher',
  },
  {
    email: 'admin@cedarhollow.test',
    name: 'Ivo Renn',
    role: 'admin',
    about: 'runs the installation',
  },
  {
    email: 'student@cedarhollow.test',
    name: 'Noor Halvorsen',
    role: 'student',
    about: '4-string bass, standard tuning',
    instrument: {
      name: 'Sunburst 4-string',
      presetId: 'bass-4',
      tuning: BASS_4,
      frets: 20,
      scaleLengthMm: 864,
      handedness: 'right',
      accidentals: 'flat',
    },
  },
  {
    email: 'tobiah@cedarhollow.test',
    name: 'Tobiah Venn',
    role: 'student',
    about: '5-string bass with a low B',
    instrument: {
      name: 'Five-string',
      presetId: 'bass-5',
      tuning: BASS_5,
      frets: 24,
      scaleLengthMm: 889,
      handedness: 'right',
      accidentals: 'flat',
    },
  },
  {
    email: 'lucia@cedarhollow.test',
    name: 'Lucia Amari',
    role: 'student',
    about: '6-string guitar, standard tuning',
    instrument: {
      name: 'Nylon-string guitar',
      presetId: 'guitar-6',
      tuning: GUITAR_6,
      frets: 19,
      scaleLengthMm: 650,
      handedness: 'right',
      accidentals: 'sharp',
    },
  },
  {
    email: 'rafe@cedarhollow.test',
    name: 'Rafe Okonkwo',
    role: 'student',
    about: '4-string bass in drop D; has not practised for 9 days',
    restDays: 9,
    instrument: {
      name: 'Drop-D bass',
      presetId: 'bass-4-drop-d',
      tuning: BASS_4_DROP_D,
      frets: 21,
      scaleLengthMm: 864,
      handedness: 'right',
      accidentals: 'sharp',
    },
  },
  {
    email: 'signe@cedarhollow.test',
    name: 'Signe Marlow',
    role: 'student',
    about: 'left-handed 4-string bass',
    instrument: {
      name: 'Left-handed short scale',
      presetId: 'bass-4',
      tuning: BASS_4,
      frets: 22,
      scaleLengthMm: 762,
      handedness: 'left',
      accidentals: 'flat',
    },
  },
]
