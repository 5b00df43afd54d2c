/**
 * A refusal's field messages as lines a person reads, each field named the way its form names it
 * ("Full steel brick: bricks loaded must be ..."), never by its path (`loaded.0.count`). A path the form cannot
 * name, or whose message names it already ("Not enough "Full steel brick" ..."), keeps its message alone.
 *
 * @param nameOf the form's name for a path split at its dots (`['loaded', '0', 'count']`), or undefined.
 */
export function fieldProblemLines(
  fields: Readonly<Record<string, string>> | undefined,
  nameOf: (path: readonly string[]) => string | undefined,
): string[] {
  const lines = Object.entries(fields ?? {}).map(([path, message]) => {
    const name = nameOf(path.split('.'))
    return name && !message.includes(name) ? `${name}: ${lowerFirst(message)}` : message
  })
  return [...new Set(lines)]
}

// After a name and a colon the message reads on in lower case, unless it starts with a capitalised abbreviation.
const lowerFirst = (message: string) =>
  /^[A-Z][a-z]/.test(message) ? message[0]!.toLowerCase() + message.slice(1) : message
