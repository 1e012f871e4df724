import 'reflect-metadata'
import { afterAll } from 'vitest'
import { dropLeftDatabases } from './postgres'

afterAll(dropLeftDatabases)
