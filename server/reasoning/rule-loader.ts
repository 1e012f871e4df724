import { readdirSync, readFileSync } from 'node:fs'
import path from 'node:path'
import { z } from 'zod'
import {
  consumableSpecSchema,
  modificationSpecSchema,
  ruleFileSchema,
  type ConsumableSpec,
  type ModificationSpec,
  type RuleFile,
} from './rule-file.schema'

/** A rules folder that cannot be used; start-up stops with this message. */
export class RuleFileError extends Error {
  constructor(file: string, problem: string) {
    super(`${file}: ${problem}`)
    this.name = 'RuleFileError'
  }
}

function describe(error: z.ZodError): string {
  return error.issues
    .slice(0, 5)
    .map((issue) => `${issue.path.length ? issue.path.join('.') : '(file)'}: ${issue.message}`)
    .join('; ')
}

function readJson(file: string, label: string): unknown {
  try {
    return JSON.parse(readFileSync(file, 'utf8'))
  } catch (error) {
    throw new RuleFileError(label, `not valid JSON (${(error as Error).message})`)
  }
}

function parseWith<S extends z.ZodType>(schema: S, value: unknown, label: string): z.infer<S> {
  const parsed = schema.safeParse(value)
  if (!parsed.success) throw new RuleFileError(label, describe(parsed.error))
  return parsed.data
}

export type LoadedRules = {
  files: RuleFile[]
  modifications: ModificationSpec[]
  consumables: ConsumableSpec[]
}

/**
 * Reads and checks every file under the rules folder: the rule files at its top
 * level and the modification and consumable catalogues under catalogue/.
 */
export function loadRules(rulesDir: string): LoadedRules {
  const label = (name: string) => path.join('rules', name)
  const modifications = parseWith(
    z.array(modificationSpecSchema),
    readJson(path.join(rulesDir, 'catalogue', 'modifications.json'), label('catalogue/modifications.json')),
    label('catalogue/modifications.json'),
  )
  const consumables = parseWith(
    z.array(consumableSpecSchema),
    readJson(path.join(rulesDir, 'catalogue', 'consumables.json'), label('catalogue/consumables.json')),
    label('catalogue/consumables.json'),
  )
  const modificationNames = new Set(modifications.map((m) => m.name))
  const files = readdirSync(rulesDir)
    .filter((name) => name.endsWith('.json'))
    .sort()
    .map((name) => {
      const file = parseWith(ruleFileSchema, readJson(path.join(rulesDir, name), label(name)), label(name))
      if (`${file.id}.json` !== name) throw new RuleFileError(label(name), `id "${file.id}" must match the file name`)
      file.rules.forEach((rule, index) => {
        if (rule.event.type === 'modification' && !modificationNames.has(rule.event.params.modification)) {
          throw new RuleFileError(
            label(name),
            `rules.${index}.event.params.modification: "${rule.event.params.modification}" is not in catalogue/modifications.json`,
          )
        }
      })
      return file
    })
  if (files.length === 0) throw new RuleFileError('rules', 'no rule files found')
  return { files, modifications, consumables }
}
