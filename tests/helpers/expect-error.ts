import { expect } from 'vitest'

type ErrorAnswer = { status: number; body: { error?: { details?: { path: string; message: string }[] } } }

/** A 400 whose field messages name `path` (and, if given, say `message`). */
export function expectBadRequest(response: ErrorAnswer, path: string, message?: RegExp) {
  expect(response.status, JSON.stringify(response.body)).toBe(400)
  const detail = response.body.error?.details?.find((d) => d.path === path)
  expect(detail, `no message for ${path} in ${JSON.stringify(response.body)}`).toBeDefined()
  if (message) expect(detail!.message).toMatch(message)
}
