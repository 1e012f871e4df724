import type { z } from 'zod'
import { errorResponseSchema, type FieldError } from '@shared/schemas/errors'

/** Every failed API call arrives as this one error type. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details: FieldError[] = [],
  ) {
    super(message)
    this.name = 'ApiError'
  }

  /** The message for one form field, if the server named it. */
  fieldMessage(path: string): string | undefined {
    return this.details.find((detail) => detail.path === path)?.message
  }
}

type Query = Record<string, string | number | boolean | undefined | null>
type RequestOptions = { query?: Query; body?: unknown; signal?: AbortSignal }

let onUnauthorized: (() => void) | null = null
/** One place decides what a 401 means for the app (the session store sends the user to sign-in). */
export function setUnauthorizedHandler(handler: () => void) {
  onUnauthorized = handler
}

export function apiUrl(path: string, query?: Query): string {
  const params = new URLSearchParams()
  for (const [key, value] of Object.entries(query ?? {})) {
    if (value !== undefined && value !== null && value !== '') params.set(key, String(value))
  }
  const search = params.toString()
  return `/api${path}${search ? `?${search}` : ''}`
}

/** An error answer as an `ApiError`: the server's own code and message when it sent the one error shape. */
export function apiErrorFrom(status: number, body: unknown): ApiError {
  const parsed = errorResponseSchema.safeParse(body)
  if (parsed.success) {
    const { code, message, details } = parsed.data.error
    return new ApiError(status, code, message, details)
  }
  return new ApiError(status, 'http_error', `The server answered ${status}.`)
}

/** The error for a request that never reached the server. */
export function networkError(): ApiError {
  return new ApiError(0, 'network', 'Cannot reach the Fitwright server. Check the connection and try again.')
}

/** Tells the one 401 handler that the session ended (for calls that do not go through `request`, such as an upload). */
export function notifyUnauthorized() {
  onUnauthorized?.()
}

/** The session's CSRF token, which the server keeps in a cookie only our own pages can read. */
export function csrfHeader(): Record<string, string> {
  const match = /(?:^|;\s*)fitwright-csrf=([^;]+)/.exec(typeof document === 'undefined' ? '' : document.cookie)
  return match ? { 'x-csrf-token': decodeURIComponent(match[1]!) } : {}
}

/** Pages open without a session need a CSRF token too: asks for one first when there is none. */
export async function ensureCsrfToken(): Promise<void> {
  if (Object.keys(csrfHeader()).length === 0) await refreshCsrfToken()
}

/** Asks the server for a token (before the first sign-in, or after the session changed). */
export async function refreshCsrfToken(): Promise<void> {
  await fetch(apiUrl('/auth/csrf'), { credentials: 'same-origin' }).catch(() => undefined)
}

async function isCsrfRefusal(response: Response): Promise<boolean> {
  if (response.status !== 403) return false
  const body: unknown = await response
    .clone()
    .json()
    .catch(() => null)
  return errorResponseSchema.safeParse(body).data?.error.code === 'csrf'
}

async function send(method: string, path: string, options: RequestOptions, retried = false): Promise<Response> {
  const isForm = options.body instanceof FormData
  const unsafe = method !== 'GET'
  let response: Response
  try {
    response = await fetch(apiUrl(path, options.query), {
      method,
      credentials: 'same-origin',
      headers: {
        ...(options.body === undefined || isForm ? {} : { 'Content-Type': 'application/json' }),
        ...(unsafe ? csrfHeader() : {}),
      },
      body: options.body === undefined ? undefined : isForm ? (options.body as FormData) : JSON.stringify(options.body),
      signal: options.signal,
    })
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause
    throw networkError()
  }
  // No token yet, or one from a session that ended: fetch a fresh one and try once more.
  if (unsafe && !retried && (await isCsrfRefusal(response))) {
    await refreshCsrfToken()
    return send(method, path, options, true)
  }
  if (!response.ok) {
    const error = apiErrorFrom(response.status, await response.json().catch(() => null))
    if (response.status === 401 && !path.startsWith('/auth/')) notifyUnauthorized()
    throw error
  }
  return response
}

/** A JSON call whose answer is checked against the shared schema. */
export async function request<S extends z.ZodType>(
  method: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE',
  path: string,
  schema: S,
  options: RequestOptions = {},
): Promise<z.infer<S>> {
  const response = await send(method, path, options)
  const body: unknown = response.status === 204 ? null : await response.json()
  return schema.parse(body)
}

/** A call whose answer carries no body worth reading (204). */
export async function requestVoid(method: 'POST' | 'DELETE' | 'PUT', path: string, options: RequestOptions = {}) {
  await send(method, path, options)
}
