import { describe, expect, it } from 'vitest'
import { z } from 'zod'
import { fieldMessages, issuesAsFieldErrors, placeFieldMessages } from '@/lib/field-errors'

describe('field messages', () => {
  it('names zod issues by their dotted path, as the server does', () => {
    const schema = z.object({ name: z.string().min(1, 'Give a name.'), slots: z.object({ head: z.string().min(1, 'Choose a head.') }) })
    const parsed = schema.safeParse({ name: '', slots: { head: '' } })
    expect(parsed.success).toBe(false)
    expect(issuesAsFieldErrors(parsed.error!.issues)).toEqual([
      { path: 'name', message: 'Give a name.' },
      { path: 'slots.head', message: 'Choose a head.' },
    ])
  })

  it('keeps the first message of a field that has several', () => {
    expect(
      fieldMessages([
        { path: 'password', message: 'Use at least 10 characters.' },
        { path: 'password', message: 'Use a letter and a digit.' },
        { path: 'email', message: 'Enter a valid e-mail address.' },
      ]),
    ).toEqual({ password: 'Use at least 10 characters.', email: 'Enter a valid e-mail address.' })
  })

  it('places messages by the fields a form shows and says when one has no field to sit beside', () => {
    const errors = [
      { path: 'email', message: 'A user with that e-mail exists already.' },
      { path: 'team', message: 'No such team.' },
    ]
    expect(placeFieldMessages(errors, ['email', 'name'])).toEqual({
      messages: { email: 'A user with that e-mail exists already.' },
      unplaced: true,
    })
    expect(placeFieldMessages(errors.slice(0, 1), ['email', 'name'])).toEqual({
      messages: { email: 'A user with that e-mail exists already.' },
      unplaced: false,
    })
  })
})
