/** The cookie pairs a response sets, as one `Cookie` header value. */
const cookiesOf = (response: Response) =>
  response.headers
    .getSetCookie()
    .map((cookie) => cookie.split(';')[0]!)
    .join('; ')

/** Signs in over HTTP as a browser would; returns the headers every later request carries. */
export async function signInOverHttp(url: string, email: string, password: string) {
  const first = await fetch(`${url}/api/v1/session`)
  const { csrfToken } = (await first.json()) as { csrfToken: string }
  const answer = await fetch(`${url}/api/v1/session`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', 'x-csrf-token': csrfToken, cookie: cookiesOf(first) },
    body: JSON.stringify({ email, password }),
  })
  if (answer.status !== 200) throw new Error(`signing in answered ${answer.status}: ${await answer.text()}`)
  const body = (await answer.json()) as { csrfToken: string }
  return { cookie: cookiesOf(answer), 'x-csrf-token': body.csrfToken }
}
