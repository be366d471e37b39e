// Tiny XML writing helpers for the MusicXML export (escaping and indented elements).

const ESCAPES: Record<string, string> = {
  '&': '&amp;',
  '<': '&lt;',
  '>': '&gt;',
  '"': '&quot;',
  "'": '&apos;',
}

/**
 * Escapes text for XML content or attribute values.
 *
 * @example
 * escapeXml('Bass & "guitar"') // 'Bass &amp; &quot;guitar&quot;'
 */
export function escapeXml(text: string): string {
  return text.replace(/[&<>"']/g, (char) => ESCAPES[char] ?? char)
}

type Attributes = Record<string, string | number | undefined>

function attributeText(attributes: Attributes): string {
  return Object.entries(attributes)
    .filter(([, value]) => value !== undefined)
    .map(([name, value]) => ` ${name}="${escapeXml(String(value))}"`)
    .join('')
}

/**
 * One element: empty (`<tie type="start"/>`), with text, or with child elements (already written
 * strings, indented one level).
 *
 * @example
 * element('pitch', {}, [element('step', {}, 'E'), element('octave', {}, 2)])
 * // '<pitch>\n  <step>E</step>\n  <octave>2</octave>\n</pitch>'
 */
export function element(
  name: string,
  attributes: Attributes = {},
  content?: string | number | readonly string[],
): string {
  const open = `<${name}${attributeText(attributes)}`
  if (content === undefined) return `${open}/>`
  if (typeof content !== 'object') return `${open}>${escapeXml(String(content))}</${name}>`
  const children = content.filter((child) => child !== '')
  if (children.length === 0) return `${open}/>`
  const inner = children.map((child) => child.replace(/^/gm, '  ')).join('\n')
  return `${open}>\n${inner}\n</${name}>`
}
