import type { H3Event } from 'h3'
import { BEAM_ENGINE_VERSION, BeamInputError, breedPlan, parseIon, stripPlan, type BindingSources, type BreedPlan, type BreedRequest, type StripPlan, type StripRequest } from '#shared/beam'
import { ENGINE_VERSION, subshellLabel } from '#shared/physics'
import { SCF_METHOD } from '#shared/physics/scf'
import type { ScfOrbital } from '#shared/physics/scf/types'
import type { BeamPlanInput } from '#shared/schemas/beam'
import type { BeamPlanRow } from '#shared/types/db'

function badInput(e: unknown): never {
  if (e instanceof BeamInputError) {
    throw createError({ statusCode: 400, statusMessage: 'Invalid input', message: 'Invalid input', data: { issues: [{ path: e.field, message: e.message }] } })
  }
  throw e
}

/** The strip plan, or a 400 naming the field the engine refused. */
export function runStrip(req: StripRequest): StripPlan {
  try {
    return stripPlan(req)
  } catch (e) {
    badInput(e)
  }
}

const HARTREE_EV = 27.211386245988 // CODATA 2018

/**
 * What the server knows beyond the engine's defaults for element z, by charge state: binding
 * energies that recorded species carry (`bindingEnergies`, from the relativistic engine) and the
 * orbital eigenvalues of SCF solves already in the cache (never solved here: a breed answer must
 * stay fast). Only the orbital lists are read, not the stored densities.
 */
export async function bindingSources(z: number): Promise<BindingSources> {
  const db = useDb()
  const [records, scfRows] = await Promise.all([
    db('species as s')
      .join('species_results as r', 'r.species_id', 's.id')
      .where('s.z', z)
      .whereRaw("jsonb_exists(r.result, 'bindingEnergies')")
      .orderBy('r.recorded_at', 'asc')
      .select('s.charge', db.raw("r.result->'bindingEnergies' as bindings")) as Promise<Array<{ charge: number; bindings: unknown }>>,
    db('species_scf_cache')
      .where({ z, method: SCF_METHOD, engine_version: ENGINE_VERSION })
      .select('charge', db.raw("result->'species'->'orbitals' as orbitals"), db.raw("(result->'species'->>'converged')::boolean as converged")) as Promise<Array<{ charge: number; orbitals: ScfOrbital[] | null; converged: boolean }>>,
  ])
  const sources: BindingSources = {}
  for (const r of records) if (Array.isArray(r.bindings)) (sources.recorded ??= {})[r.charge] = r.bindings as never
  for (const r of scfRows) {
    if (!r.converged || !Array.isArray(r.orbitals)) continue
    ;(sources.scf ??= {})[r.charge] = Object.fromEntries(r.orbitals.map((o) => [subshellLabel(o.n, o.l), -o.energyHartree * HARTREE_EV]))
  }
  return sources
}

/** The breed plan with any recorded binding energies, or a 400 naming the field refused. */
export async function runBreed(req: Omit<BreedRequest, 'bindings'>): Promise<BreedPlan> {
  let z: number
  try {
    z = parseIon(req.ion).z
  } catch (e) {
    badInput(e)
  }
  const bindings = await bindingSources(z)
  try {
    return breedPlan({ ...req, bindings })
  } catch (e) {
    badInput(e)
  }
}

const db = () => useDb()
const NOT_IN_STOCK = ['retired', 'depleted']

/** The stripper foil with this id if it is one in stock, or a 400. */
export async function stripperFoilOr400(id: string) {
  const s = await db()('samples').where({ id }).first()
  if (!s || s.form !== 'stripper_foil' || NOT_IN_STOCK.includes(s.status) || !s.formula) {
    throw createError({ statusCode: 400, statusMessage: 'Invalid input', message: 'Invalid input', data: { issues: [{ path: 'stripperSampleId', message: 'Choose a stripper foil that is in stock (not retired or depleted) and has a formula' }] } })
  }
  return s
}

/** The sample with this id if it holds element z, or a 400. */
export async function sourceSampleOr400(id: string, z: number) {
  const s = await db()('samples').where({ id }).first()
  const holds = s ? await db()('sample_components').where({ sample_id: id, z }).first() : null
  if (!s || !holds) {
    throw createError({ statusCode: 400, statusMessage: 'Invalid input', message: 'Invalid input', data: { issues: [{ path: 'sourceSampleId', message: 'Choose a sample that contains the element of the ion' }] } })
  }
  return s
}

/** Runs everything a plan holds from its inputs: the strip plan, and the breed plan when asked. */
export async function computePlan(input: BeamPlanInput, stripper: { formula: string | null; areal_density_ug_cm2: number | null } | null) {
  const medium = input.medium ?? stripper!.formula!
  const arealDensity = input.arealDensity ?? stripper?.areal_density_ug_cm2 ?? undefined
  const strip = runStrip({ ion: input.ion, energy: input.energy, unit: input.unit, medium, gas: input.gas, arealDensityUgCm2: arealDensity })
  const breed = input.breeding ? await runBreed({ ion: `${strip.ionDetail.massNumber}${strip.ionDetail.symbol}`, electronEnergyEv: input.breeding.electronEnergy, currentDensityACm2: input.breeding.currentDensity }) : null
  const primary = strip.models[0]!
  const charge = input.chargeState ?? primary.mostProbable
  const rig = strip.rigidity.find((r) => r.charge === charge) ?? null
  return { strip, breed, medium, arealDensity: arealDensity ?? null, charge, fraction: primary.fractions[charge]?.fraction ?? 0, rigidityTm: rig?.tm ?? null }
}

/** Saves a plan with its audit row in one transaction. */
export async function savePlan(event: H3Event, input: BeamPlanInput) {
  const user = requireUser(event)
  const stripper = input.stripperSampleId ? await stripperFoilOr400(input.stripperSampleId) : null
  const computed = await computePlan(input, stripper)
  if (input.sourceSampleId) await sourceSampleOr400(input.sourceSampleId, computed.strip.ionDetail.z)
  const { strip } = computed
  const title = input.title || `${strip.ion} at ${strip.energyMeVPerU.toPrecision(4)} MeV/u through ${computed.medium}`
  return db().transaction(async (trx) => {
    const [row] = await trx('beam_plans')
      .insert({
        title,
        z: strip.ionDetail.z,
        mass_number: strip.ionDetail.massNumber,
        ion_label: strip.ion,
        energy_mev_u: strip.energyMeVPerU,
        medium: computed.medium,
        charge_state: computed.charge,
        charge_fraction: computed.fraction,
        rigidity_tm: computed.rigidityTm,
        stripper_sample_id: input.stripperSampleId ?? null,
        source_sample_id: input.sourceSampleId ?? null,
        engine_version: BEAM_ENGINE_VERSION,
        inputs: JSON.stringify({ ...input, medium: computed.medium, arealDensity: computed.arealDensity ?? undefined }) as never,
        result: JSON.stringify({ strip: computed.strip, breed: computed.breed }) as never,
        note: input.note ?? null,
        created_by: user.id,
      })
      .returning('*')
    await writeAudit(trx, event, { action: 'beam_plan.saved', entityType: 'beam_plan', entityId: row!.id, after: { title, ion: strip.ion, medium: computed.medium, chargeState: computed.charge, engine: BEAM_ENGINE_VERSION, stripperSampleId: input.stripperSampleId ?? null, sourceSampleId: input.sourceSampleId ?? null } })
    return row!
  })
}

/** The list shape of a plan row. */
export function planOut(r: BeamPlanRow & { created_by_name?: string | null; stripper_code?: string | null; source_code?: string | null }) {
  return {
    id: r.id,
    title: r.title,
    ion: r.ion_label,
    z: r.z,
    massNumber: r.mass_number,
    energyMeVPerU: r.energy_mev_u,
    medium: r.medium,
    chargeState: r.charge_state,
    chargeFraction: r.charge_fraction,
    rigidityTm: r.rigidity_tm,
    stripperSample: r.stripper_sample_id ? { id: r.stripper_sample_id, code: r.stripper_code ?? null } : null,
    sourceSample: r.source_sample_id ? { id: r.source_sample_id, code: r.source_code ?? null } : null,
    engine: r.engine_version,
    createdBy: r.created_by_name ?? null,
    createdAt: r.created_at,
  }
}

/** The plan with this id, or a 404. */
export async function loadPlanOr404(id: string) {
  const row = await db()('beam_plans as p')
    .leftJoin('users as u', 'u.id', 'p.created_by')
    .leftJoin('samples as st', 'st.id', 'p.stripper_sample_id')
    .leftJoin('samples as so', 'so.id', 'p.source_sample_id')
    .where('p.id', id)
    .first('p.*', 'u.name as created_by_name', 'st.code as stripper_code', 'so.code as source_code')
  if (!row) throw createError({ statusCode: 404, statusMessage: 'Not found', message: 'No such plan' })
  return row as BeamPlanRow & { created_by_name: string | null; stripper_code: string | null; source_code: string | null }
}
