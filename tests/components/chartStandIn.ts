import { defineComponent, h } from 'vue'

/**
 * jsdom has no canvas, so the chart package's components are stood in for by ones that draw nothing and keep what
 * they were given (the kind of chart, how many data sets, the attributes such as role and aria-label).
 */
const standIn = (kind: string) =>
  defineComponent({
    props: { data: { type: Object, required: true }, options: { type: Object, default: () => ({}) } },
    setup:
      (props, { attrs }) =>
      () =>
        h('canvas', {
          ...attrs,
          'data-chart': kind,
          'data-sets': (props.data as { datasets: unknown[] }).datasets.length,
        }),
  })

export const Line = standIn('line')
export const Bar = standIn('bar')
