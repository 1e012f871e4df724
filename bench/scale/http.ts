import { readFileSync } from 'node:fs'
import path from 'node:path'

/** The longest a measured request may take before it counts as failed. */
export const REQUEST_TIMEOUT_MS = 60_000

/** A signed-in user of the app, over real HTTP with the session cookie. */
export type Client = {
  get: (route: string) => Promise<unknown>
  send: (method: 'POST' | 'PATCH', route: string, body: unknown) => Promise<unknown>
  upload: (route: string, fields: Record<string, string>, file: string) => Promise<unknown>
}

async function answer(response: Response): Promise<unknown> {
  const text = await response.text()
  if (!response.ok) throw new Error(`${response.status} ${text.slice(0, 160)}`)
  return text ? (JSON.parse(text) as unknown) : null
}

const cookiesOf = (response: Response) =>
  response.headers
    .getSetCookie()
    .map((line) => line.split(';')[0])
    .join('; ')

/** The session's CSRF token, which every POST/PATCH sends back (README, API section). */
async function csrfToken(base: string, cookie: string): Promise<{ cookie: string; token: string }> {
  const response = await fetch(`${base}/api/auth/csrf`, { headers: cookie ? { cookie } : {} })
  const body = (await answer(response)) as { token: string }
  return { cookie: cookie || cookiesOf(response), token: body.token }
}

function client(base: string, cookie: string, token: string, timeoutMs: number): Client {
  const call = (route: string, init: RequestInit) =>
    fetch(`${base}${route}`, {
      ...init,
      headers: { cookie, 'x-csrf-token': token, ...init.headers },
      signal: AbortSignal.timeout(timeoutMs),
    }).then(answer)
  return {
    get: (route) => call(route, { method: 'GET' }),
    send: (method, route, body) => call(route, { method, body: JSON.stringify(body), headers: { 'content-type': 'application/json' } }),
    upload(route, fields, file) {
      const form = new FormData()
      for (const [name, value] of Object.entries(fields)) form.append(name, value)
      form.append('file', new Blob([readFileSync(file)], { type: 'text/csv' }), path.basename(file))
      return call(route, { method: 'POST', body: form })
    },
  }
}

export async function signIn(base: string, email: string, password: string, timeoutMs = REQUEST_TIMEOUT_MS): Promise<Client> {
  const before = await csrfToken(base, '')
  const response = await fetch(`${base}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', cookie: before.cookie, 'x-csrf-token': before.token },
    body: JSON.stringify({ email, password }),
  })
  await answer(response)
  const cookie = response.headers
    .getSetCookie()
    .map((line) => line.split(';')[0])
    .filter((line) => line?.startsWith('fitwright.sid='))
    .join('; ')
  if (!cookie) throw new Error(`Signing in as ${email} set no session cookie.`)
  const after = await csrfToken(base, cookie)
  return client(base, cookie, after.token, timeoutMs)
}
