// Recording from the microphone with MediaRecorder (Opus in WebM or Ogg, or MP4 on Safari);
// stops by itself after the longest take we accept. MediaRecorder's WebM carries no duration, so
// players can neither show the length nor seek: the measured length is written into the file and
// handed on to be stored.
import fixWebmDuration from 'fix-webm-duration'
import { onBeforeUnmount, ref } from 'vue'

const MAX_SECONDS = 10 * 60
const TYPES = ['audio/webm;codecs=opus', 'audio/ogg;codecs=opus', 'audio/webm', 'audio/mp4']

/** The take with its length written into the WebM header (other formats carry their own). */
export async function withDuration(audio: Blob, durationMs: number): Promise<Blob> {
  if (!audio.type.includes('webm')) return audio
  try {
    return await fixWebmDuration(audio, durationMs, { logger: false })
  } catch {
    return audio // a header we cannot read: the stored length still shows
  }
}

const recorderSupported = () =>
  typeof window !== 'undefined' &&
  'MediaRecorder' in window &&
  Boolean(navigator.mediaDevices?.getUserMedia)

const extensionOf = (type: string) =>
  type.includes('mp4') ? 'm4a' : type.includes('ogg') ? 'ogg' : 'webm'

export function useMediaRecorder(
  onRecorded: (audio: Blob, extension: string, durationMs: number) => void,
) {
  const isRecording = ref(false)
  const seconds = ref(0)
  const error = ref('')
  const supported = recorderSupported()
  let recorder: MediaRecorder | null = null
  let stream: MediaStream | null = null
  let timer: ReturnType<typeof setInterval> | undefined

  function release() {
    clearInterval(timer)
    stream?.getTracks().forEach((track) => track.stop())
    stream = null
    isRecording.value = false
  }

  async function start() {
    error.value = ''
    try {
      stream = await navigator.mediaDevices.getUserMedia({ audio: true })
    } catch {
      error.value =
        'The microphone is not available. Allow it in the browser, or upload a file instead.'
      return
    }
    const mimeType = TYPES.find((type) => MediaRecorder.isTypeSupported(type)) ?? ''
    const chunks: Blob[] = []
    recorder = new MediaRecorder(stream, mimeType ? { mimeType } : {})
    recorder.ondataavailable = (event) => event.data.size && chunks.push(event.data)
    let startedAt = 0
    recorder.onstart = () => (startedAt = performance.now())
    recorder.onstop = async () => {
      const type = recorder?.mimeType || mimeType || 'audio/webm'
      const durationMs = Math.max(1, Math.round(performance.now() - startedAt))
      release()
      const audio = await withDuration(new Blob(chunks, { type }), durationMs)
      onRecorded(audio, extensionOf(type), durationMs)
    }
    recorder.start(1000)
    seconds.value = 0
    isRecording.value = true
    timer = setInterval(() => (seconds.value += 1) >= MAX_SECONDS && stop(), 1000)
  }

  function stop() {
    if (recorder?.state === 'recording') recorder.stop()
  }

  onBeforeUnmount(() => {
    if (recorder?.state === 'recording') {
      recorder.onstop = null
      recorder.stop()
    }
    release()
  })

  return { supported, isRecording, seconds, error, start, stop }
}
