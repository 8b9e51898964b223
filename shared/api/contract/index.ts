import type { ApiRoute } from '../types'
import auth from './auth'
import beam from './beam'
import certificates from './certificates'
import custody from './custody'
import inventory from './inventory'
import samples from './samples'
import species from './species'
import system from './system'
import tokens from './tokens'

// Every API route, by resource. A new route: add its entry to the resource's file here (or a new
// file, listed below) beside its schema in shared/schemas/; tests/api/openapi.test.ts names any
// route file under server/api/ that has no entry, and any entry with no route file.
export const API_ROUTES: ApiRoute[] = [...auth, ...tokens, ...samples, ...species, ...beam, ...certificates, ...inventory, ...custody, ...system]
