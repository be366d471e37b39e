// Draws a notation model with VexFlow into an element: systems that wrap to the width, a standard
// staff and (optionally) a TAB staff per system, the current note marked with a CSS class.
import type * as VexFlowModule from 'vexflow'
import {
  keySignatureName,
  type NotationModel,
  type StaffEvent,
  type StaffMeasure,
} from './notation-model'

type VF = typeof VexFlowModule

export interface RenderOptions {
  width: number
  showTab: boolean
  currentIndex: number | null
}

const STAFF_HEIGHT = 100
const TAB_LINE = 13
const LEFT = 6
/** Words above notes in the app's font, with the accidental glyphs Roboto lacks. */
const WORDS_FONT = "Roboto, 'Ambitus Accidentals', sans-serif"

/** Width a measure wants: room per note, and the clef and key at the start of a system. */
function measureWidth(measure: StaffMeasure, firstInRow: boolean): number {
  const notes = Math.max(measure.events.length, 1) * 30 + 26
  const start = firstInRow
    ? 56 + 9 * Math.abs(measure.keyFifths)
    : measure.keyChange
      ? 12 * Math.abs(measure.keyFifths) + 14
      : 0
  return Math.max(90, notes) + start
}

/** Splits measures into systems that fit the width (at least one measure each). */
export function systemsFor(measures: readonly StaffMeasure[], width: number): StaffMeasure[][] {
  const rows: StaffMeasure[][] = []
  let row: StaffMeasure[] = []
  let used = 0
  for (const measure of measures) {
    const wanted = measureWidth(measure, row.length === 0)
    if (row.length > 0 && used + wanted > width) {
      rows.push(row)
      row = []
      used = 0
    }
    used += measureWidth(measure, row.length === 0)
    row.push(measure)
  }
  if (row.length > 0) rows.push(row)
  return rows
}

function noteClass(event: StaffEvent, current: number | null) {
  const classes = [`note-${event.noteIndex}`]
  if (event.noteIndex !== null && event.noteIndex === current) classes.push('notation-current')
  return classes.join(' ')
}

function staveNote(vf: VF, model: NotationModel, event: StaffEvent) {
  const rest = event.noteIndex === null
  const note = new vf.StaveNote({
    keys: [event.key],
    duration: `${event.duration}${rest ? 'r' : ''}`,
    dots: event.dots,
    clef: model.clef,
  })
  if (event.accidental) note.addModifier(new vf.Accidental(event.accidental), 0)
  if (event.dots) vf.Dot.buildAndAttach([note], { all: true })
  if (event.text) {
    const words = new vf.Annotation(event.text)
      .setFont(WORDS_FONT, 11)
      .setVerticalJustification(vf.AnnotationVerticalJustify.TOP)
    note.addModifier(words, 0)
  }
  return note
}

function tabNote(vf: VF, event: StaffEvent) {
  if (!event.tab || event.noteIndex === null)
    return new vf.GhostNote({ duration: event.duration, dots: event.dots })
  return new vf.TabNote({ positions: [event.tab], duration: event.duration, dots: event.dots })
}

interface Drawn {
  notes: VexFlowModule.StaveNote[]
  events: StaffEvent[]
}

function drawMeasure(
  vf: VF,
  context: VexFlowModule.RenderContext,
  model: NotationModel,
  place: {
    x: number
    y: number
    width: number
    first: boolean
    showTab: boolean
    current: number | null
  },
  measure: StaffMeasure,
): Drawn {
  const stave = new vf.Stave(place.x, place.y, place.width)
  if (place.first) {
    stave.addClef(model.clef, 'default', model.clefAnnotation ?? undefined)
    stave.addKeySignature(keySignatureName(measure.keyFifths))
  } else if (measure.keyChange) stave.addKeySignature(keySignatureName(measure.keyFifths))
  if (measure.number === 1) stave.addTimeSignature(`${model.beatsPerMeasure}/4`)
  const staves: VexFlowModule.Stave[] = [stave]
  if (place.showTab) {
    const tab = new vf.TabStave(place.x, place.y + STAFF_HEIGHT - 22, place.width, {
      numLines: model.strings,
    })
    if (place.first) tab.addTabGlyph()
    staves.push(tab)
  }
  const start = Math.max(...staves.map((s) => s.getNoteStartX()))
  for (const s of staves) s.setNoteStartX(start).setContext(context).draw()
  const notes = measure.events.map((event) => staveNote(vf, model, event))
  const voices = [
    new vf.Voice({ numBeats: model.beatsPerMeasure, beatValue: 4 })
      .setMode(vf.Voice.Mode.SOFT)
      .addTickables(notes),
  ]
  const tabs = place.showTab ? measure.events.map((event) => tabNote(vf, event)) : []
  if (place.showTab) {
    voices.push(
      new vf.Voice({ numBeats: model.beatsPerMeasure, beatValue: 4 })
        .setMode(vf.Voice.Mode.SOFT)
        .addTickables(tabs),
    )
  }
  const beams = vf.Beam.generateBeams(notes.filter((_, i) => measure.events[i]?.noteIndex !== null))
  const formatter = new vf.Formatter()
  for (const voice of voices) formatter.joinVoices([voice])
  formatter.format(voices, place.x + place.width - start - 12)
  voices.forEach((voice, i) => voice.draw(context, staves[i]))
  for (const beam of beams) beam.setContext(context).draw()
  // Classes go on the drawn groups (VexFlow names them by id): note-<index>, and the current one.
  measure.events.forEach((event, i) => {
    if (event.noteIndex === null) return
    for (const drawn of [notes[i], tabs[i]]) {
      drawn?.getSVGElement()?.classList.add(...noteClass(event, place.current).split(' '))
    }
  })
  return { notes, events: measure.events }
}

function drawTies(vf: VF, context: VexFlowModule.RenderContext, drawn: Drawn) {
  drawn.events.forEach((event, i) => {
    const next = drawn.events[i + 1]
    if (!event.tieStart || !next?.tieStop) return
    new vf.StaveTie({
      firstNote: drawn.notes[i],
      lastNote: drawn.notes[i + 1],
      firstIndexes: [0],
      lastIndexes: [0],
    })
      .setContext(context)
      .draw()
  })
}

/**
 * Renders the model into `host` (its content is replaced) as SVG and returns the drawn height.
 * Measures wrap into systems that fit `options.width`; each system is stretched to the full width.
 */
export function renderNotation(
  vf: VF,
  host: HTMLElement,
  model: NotationModel,
  options: RenderOptions,
): number {
  host.replaceChildren()
  // Phones draw at 80 % so two measures fit a line.
  const scale = options.width < 560 ? 0.8 : 1
  const width = Math.max(options.width, 200) / scale
  const rows = systemsFor(model.measures, width - 2 * LEFT)
  const rowHeight = STAFF_HEIGHT + (options.showTab ? model.strings * TAB_LINE + 40 : 0) + 10
  const renderer = new vf.Renderer(host as HTMLDivElement, vf.Renderer.Backends.SVG)
  renderer.resize(width * scale, (rows.length * rowHeight + 10) * scale)
  const context = renderer.getContext()
  context.scale(scale, scale)
  rows.forEach((row, r) => {
    const wanted = row.map((measure, i) => measureWidth(measure, i === 0))
    const scale = (width - 2 * LEFT) / wanted.reduce((a, b) => a + b, 0)
    let x = LEFT
    const drawn: Drawn = { notes: [], events: [] }
    row.forEach((measure, i) => {
      const w = (wanted[i] ?? 100) * (r === rows.length - 1 ? Math.min(scale, 1.6) : scale)
      const place = {
        x,
        y: r * rowHeight + 10,
        width: w,
        first: i === 0,
        showTab: options.showTab,
        current: options.currentIndex,
      }
      const piece = drawMeasure(vf, context, model, place, measure)
      drawn.notes.push(...piece.notes)
      drawn.events.push(...piece.events)
      x += w
    })
    // Ties join pieces within a system (a tie broken by a line end is not drawn).
    drawTies(vf, context, drawn)
  })
  return (rows.length * rowHeight + 10) * scale
}
