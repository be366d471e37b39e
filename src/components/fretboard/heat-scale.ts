// Our own sequential colour ramps for heat maps: lightness rises steadily from one end to the other,
// so the order reads without telling red from green (colour-blind safe); plus WCAG contrast helpers.

/** Stops from heat 0 (lightest) to heat 1 (deepest). */
export const HEAT_RAMPS = {
  /** Sand → mint → teal → lake blue. */
  accuracy: ['#F6EED9', '#BFE0C9', '#6FB8A8', '#2E8593', '#1B4F72'],
  /** Cream → amber → rosewood → dark bark. */
  speed: ['#F8EEDB', '#F1C98A', '#D98F4E', '#A85A24', '#5E2F16'],
} as const
export type HeatScale = keyof typeof HEAT_RAMPS

type Rgb = [number, number, number]

/** Parses "#RGB", "#RRGGBB" or Vuetify's "r,g,b" into channels 0–255. */
export function parseColor(color: string): Rgb {
  if (color.startsWith('#')) {
    const short = color.length === 4 || color.length === 5
    const hex = short ? [...color.slice(1, 4)].map((c) => c + c).join('') : color.slice(1)
    return [0, 2, 4].map((i) => parseInt(hex.slice(i, i + 2), 16)) as Rgb
  }
  return color
    .split(',')
    .slice(0, 3)
    .map((part) => Number(part.trim())) as Rgb
}

const toHex = (rgb: Rgb) =>
  `#${rgb.map((c) => Math.round(c).toString(16).padStart(2, '0')).join('')}`.toUpperCase()

/** The ramp colour for a heat value (0..1, clamped), interpolated between neighbouring stops. */
export function heatColor(scale: HeatScale, heat: number): string {
  const stops = HEAT_RAMPS[scale]
  const t = Math.min(1, Math.max(0, Number.isFinite(heat) ? heat : 0)) * (stops.length - 1)
  const index = Math.min(stops.length - 2, Math.floor(t))
  const [a, b] = [parseColor(stops[index] ?? '#000000'), parseColor(stops[index + 1] ?? '#000000')]
  const f = t - index
  return toHex([0, 1, 2].map((i) => (a[i] ?? 0) + ((b[i] ?? 0) - (a[i] ?? 0)) * f) as Rgb)
}

/** WCAG 2.x relative luminance of a colour. */
export function luminance(color: string): number {
  const [r, g, b] = parseColor(color).map((c) => {
    const s = c / 255
    return s <= 0.03928 ? s / 12.92 : ((s + 0.055) / 1.055) ** 2.4
  }) as Rgb
  return 0.2126 * r + 0.7152 * g + 0.0722 * b
}

/** WCAG 2.x contrast ratio of two colours (1 to 21). */
export function contrastRatio(a: string, b: string): number {
  const [high, low] = [luminance(a), luminance(b)].sort((x, y) => y - x) as [number, number]
  return (high + 0.05) / (low + 0.05)
}

/** Near-black or white, whichever reads better on the given fill. */
export function textOn(fill: string): string {
  return contrastRatio(fill, '#000000') >= contrastRatio(fill, '#FFFFFF') ? '#000000' : '#FFFFFF'
}
