/**
 * A moment as the app shows it: day, month, year and time of day, in the reader's own zone unless one is named.
 *
 * @example
 * dayAndTime('2025-05-12T12:00:00Z', 'UTC') // '12 May 2025, 12:00'
 */
export const dayAndTime = (when: string | Date, timeZone?: string) =>
  new Date(when).toLocaleString('en-GB', {
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    hour: '2-digit',
    minute: '2-digit',
    timeZone,
  })
