import { vi } from 'vitest'

// jsdom has no layout engine; Vuetify's drawers, menus and overlays ask for these.
class ResizeObserverStub {
  observe() {}
  unobserve() {}
  disconnect() {}
}

globalThis.ResizeObserver ??= ResizeObserverStub as unknown as typeof ResizeObserver

if (!window.visualViewport) {
  Object.defineProperty(window, 'visualViewport', {
    value: Object.assign(new EventTarget(), {
      width: 1280,
      height: 800,
      offsetLeft: 0,
      offsetTop: 0,
      pageLeft: 0,
      pageTop: 0,
      scale: 1,
    }),
  })
}

/** Answers width queries against the window's width, the only media feature Vuetify asks about. */
function matchesWidth(query: string) {
  const min = /min-width:\s*([\d.]+)px/.exec(query)
  const max = /max-width:\s*([\d.]+)px/.exec(query)
  return (!min || window.innerWidth >= Number(min[1])) && (!max || window.innerWidth <= Number(max[1]))
}

window.matchMedia = (query: string) =>
  ({
    matches: matchesWidth(query),
    media: query,
    onchange: null,
    addEventListener() {},
    removeEventListener() {},
    addListener() {},
    removeListener() {},
    dispatchEvent: () => false,
  }) as unknown as MediaQueryList

window.scrollTo = () => {}
Element.prototype.scrollIntoView ??= () => {}

// jsdom cannot draw on a canvas: the charts render stand-ins that keep their data (tests/components/chartStandIn.ts).
vi.mock('vue-chartjs', () => import('../components/chartStandIn'))
