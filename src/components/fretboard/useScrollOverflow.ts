// Whether a scroll box is narrower than its content (so the board can say it scrolls sideways).
import { onBeforeUnmount, onMounted, ref, type Ref } from 'vue'

export function useScrollOverflow(box: Ref<HTMLElement | null>) {
  const overflowing = ref(false)
  let observer: ResizeObserver | null = null
  const measure = () => {
    const element = box.value
    overflowing.value = !!element && element.scrollWidth > element.clientWidth + 1
  }
  onMounted(() => {
    measure()
    if (typeof ResizeObserver === 'undefined' || !box.value) return
    observer = new ResizeObserver(measure)
    observer.observe(box.value)
    if (box.value.firstElementChild) observer.observe(box.value.firstElementChild)
  })
  onBeforeUnmount(() => observer?.disconnect())
  return { overflowing, measure }
}
