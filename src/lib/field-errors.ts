import type { FieldError } from '@shared/schemas/errors'

/** A zod issue, as far as a form needs it. */
type Issue = { readonly path: readonly PropertyKey[]; readonly message: string }

/** Zod issues named the way the server names them (`slots.head`), so both kinds of message share keys. */
export function issuesAsFieldErrors(issues: readonly Issue[]): FieldError[] {
  return issues.map((issue) => ({ path: issue.path.map(String).join('.'), message: issue.message }))
}

/** One message per field: the first named for it, since that is the one to fix first. */
export function fieldMessages(errors: readonly FieldError[]): Record<string, string> {
  const messages: Record<string, string> = {}
  for (const { path, message } of errors) messages[path] ??= message
  return messages
}

/**
 * Messages for the fields a form shows, and whether some message has no field
 * to sit beside (the form then says it elsewhere, so nothing goes unsaid).
 */
export function placeFieldMessages(
  errors: readonly FieldError[],
  fields: readonly string[],
): { messages: Record<string, string>; unplaced: boolean } {
  const placed = errors.filter((error) => fields.includes(error.path))
  return { messages: fieldMessages(placed), unplaced: placed.length < errors.length }
}
