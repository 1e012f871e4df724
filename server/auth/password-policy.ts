import { readFileSync } from 'node:fs'
import bcrypt from 'bcryptjs'
import { AppError } from '../errors/app-error'

/** The cost of new hashes; stored hashes of a lower cost are made again at the next sign-in. */
export const BCRYPT_ROUNDS = 12

const listFile = new URL('./common-passwords.txt', import.meta.url)

let common: Set<string> | null = null

/** Read on first use (a few hundred kilobytes, once per process). */
function commonPasswords(): Set<string> {
  common ??= new Set(
    readFileSync(listFile, 'utf8')
      .split('\n')
      .filter((line) => line !== '' && !line.startsWith('#')),
  )
  return common
}

export function isCommonPassword(password: string): boolean {
  return commonPasswords().has(password.trim().toLowerCase())
}

/** Refuses a new password found on the shipped list of common and breached-looking passwords. */
export function checkNewPassword(password: string): void {
  if (isCommonPassword(password)) {
    throw AppError.badRequest('Choose a less common password.', [
      { path: 'password', message: 'This password is on a list of common passwords; choose another.' },
    ])
  }
}

export function hashPassword(password: string, rounds = BCRYPT_ROUNDS): Promise<string> {
  return bcrypt.hash(password, rounds)
}

export function needsRehash(hash: string): boolean {
  return bcrypt.getRounds(hash) < BCRYPT_ROUNDS
}
