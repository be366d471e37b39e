// The items of the key and scale pickers: scales grouped as the trade practises them, then "More
// scales"; tonics marked when they make a theoretical key in the chosen scale.
import { keyInfo, scaleCatalog, TONICS, toUnicode } from '@/theory'

export interface PickerItem {
  title: string
  value?: string
  type?: 'subheader'
  props?: { subtitle?: string }
}

/** The scale list: each curated group under its heading; "More scales" only when asked for. */
export function scaleItems(options: { more?: boolean; leaveOut?: readonly string[] } = {}) {
  return scaleCatalog()
    .filter((group) => options.more !== false || group.id !== 'more')
    .flatMap((group): PickerItem[] => {
      const scales = group.scales.filter((s) => !options.leaveOut?.includes(s.name))
      if (scales.length === 0) return []
      return [
        { type: 'subheader', title: group.label },
        ...scales.map((s) => ({ title: s.label, value: s.name })),
      ]
    })
}

/** "9 sharps", "1 flat". */
export function signatureText(alteration: number): string {
  const count = Math.abs(alteration)
  if (count === 0) return 'no sharps or flats'
  return `${count} ${alteration > 0 ? 'sharp' : 'flat'}${count === 1 ? '' : 's'}`
}

/** The 18 tonics for a scale, a theoretical key marked with its signature and its enharmonic. */
export function tonicItems(scale: string | null): PickerItem[] {
  return TONICS.map((tonic) => {
    const info = scale ? safeKeyInfo(tonic, scale) : null
    const other = info?.theoretical ? info.enharmonic : undefined
    const subtitle = other
      ? `theoretical (${signatureText(info!.alteration)}); ${toUnicode(other.tonic)} has ${signatureText(other.alteration)}`
      : undefined
    return { title: toUnicode(tonic), value: tonic, ...(subtitle ? { props: { subtitle } } : {}) }
  })
}

/** keyInfo, or null for a scale the theory core cannot place in a key. */
export function safeKeyInfo(tonic: string, scale: string) {
  try {
    return keyInfo(tonic, scale)
  } catch (error) {
    if (error instanceof RangeError) return null
    throw error
  }
}
