// Recording from the microphone with MediaRecorder (Opus in WebM or Ogg, or MP4 on Safari);
// stops by itself after the longest take we accept.
import { onBeforeUnmount, ref } from 'vue'

const MAX_SECONDS = 10 * 60
const TYPES = ['audio/webm;codecs=opus', 'audio/ogg;codecs=opus', 'audio/webm', 'audio/mp4']

export function useMediaRecorder(onRecorded: (audio: Blob, extension: string) => void) {
  const isRecording = ref(false)
  const seconds = ref(0)
  const error = ref('')
  const supported =
    typeof window !== 'undefined' &&
    'MediaRecorder' in window &&
    Boolean(navigator.mediaDevices?.getUserMedia)
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
    recorder.onstop = () => {
      const type = recorder?.mimeType || mimeType || 'audio/webm'
      release()
      onRecorded(
        new Blob(chunks, { type }),
        type.includes('mp4') ? 'm4a' : type.includes('ogg') ? 'ogg' : 'webm',
      )
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
