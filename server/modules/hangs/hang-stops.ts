/**
 * SQL counting the findings that say stop in a hang's saved result (`calculation_result` of the hang aliased
 * `hang`, or unqualified when none): the board's statement and the operating facts read it the same way.
 */
export const stopCountSql = (hang?: string) => {
  const result = `${hang ? `${hang}.` : ''}calculation_result`
  return `(SELECT count(*) FROM jsonb_array_elements(coalesce(${result} -> 'checks', '[]'::jsonb)) c
              WHERE c ->> 'level' = 'danger')::int`
}
