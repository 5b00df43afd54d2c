import { onBeforeUnmount, onMounted, ref } from 'vue'
import { BOARD_STREAM_EVENTS, type BoardStreamData } from '../../shared/schemas/index.js'
import { BOARD_STREAM_URL } from '../api/board'

export interface BoardStreamHandlers {
  /** Something about one lineset changed. */
  lineset(linesetId: string): void
  /** A pre-run check was recorded. */
  check(): void
  /** Too much was missed to replay: read everything again. */
  resync(): void
}

// When the browser gives up on a stream (it answered an error rather than dropping), try again after this.
const REOPEN_MS = 5000

/**
 * Follows the board's server-sent events while the page is open. The browser reconnects by itself after a
 * drop and sends the last id it heard, so the server replays what was missed; `live` says whether the stream
 * is open now. `open` is replaceable for tests.
 */
export function useBoardStream(
  handlers: BoardStreamHandlers,
  open: (url: string) => EventSource = (url) => new EventSource(url, { withCredentials: true }),
) {
  const live = ref(false)
  let source: EventSource | null = null
  let reopen: ReturnType<typeof setTimeout> | null = null
  let wasLive = false

  function connect() {
    source = open(BOARD_STREAM_URL)
    source.onopen = () => {
      live.value = true
    }
    source.onerror = () => {
      live.value = false
      // CLOSED means the browser will not retry (a refusal, e.g. signed out): try again a little later.
      if (source?.readyState === 2 && !reopen)
        reopen = setTimeout(() => {
          reopen = null
          source?.close()
          connect()
        }, REOPEN_MS)
    }
    const read = (event: Event) => JSON.parse((event as MessageEvent<string>).data) as BoardStreamData
    for (const name of BOARD_STREAM_EVENTS) {
      source.addEventListener(name, (event) => {
        const data = read(event)
        if (name === 'pre-run-check') handlers.check()
        else if (data.linesetId) handlers.lineset(data.linesetId)
      })
    }
    source.addEventListener('resync', () => handlers.resync())
    // A stream that starts afresh (not resuming) after having been live may have missed anything.
    source.addEventListener('ready', () => {
      if (wasLive) handlers.resync()
      wasLive = true
    })
  }

  onMounted(connect)
  onBeforeUnmount(() => {
    if (reopen) clearTimeout(reopen)
    source?.close()
    source = null
  })
  return { live }
}
