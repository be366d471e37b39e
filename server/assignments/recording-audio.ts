// Streams a take's audio: the whole file, or one byte range (206) so players can seek; 416 when the
// range lies outside the file.
import type { Request, Response } from 'express'
import { pipeline } from 'node:stream'
import type { playable } from './recordings-service'

type Opened = Awaited<ReturnType<typeof playable>>

/** 200 with the whole file, or 206 with one byte range; 416 when the range lies outside the file. */
export function sendAudio(req: Request, res: Response, audio: Opened) {
  res.set({
    'Accept-Ranges': 'bytes',
    'Content-Type': audio.mimeType,
    'Content-Disposition': `inline; filename="${audio.fileName}"`,
    'Cache-Control': 'private, no-cache',
  })
  const ranges = req.range(audio.size, { combine: true })
  if (ranges === -1) {
    res.status(416).set('Content-Range', `bytes */${audio.size}`).end()
    return
  }
  const single =
    Array.isArray(ranges) && ranges.type === 'bytes' && ranges.length === 1 ? ranges[0] : undefined
  if (single) {
    res.status(206).set('Content-Range', `bytes ${single.start}-${single.end}/${audio.size}`)
    res.set('Content-Length', String(single.end - single.start + 1))
  } else {
    res.set('Content-Length', String(audio.size))
  }
  pipeline(audio.read(single), res, (error) => {
    if (error && error.code !== 'ERR_STREAM_PREMATURE_CLOSE')
      req.log?.warn({ err: error }, 'recording stream failed')
  })
}
