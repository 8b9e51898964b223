// The fixed words of the sample registry: what a sample physically is, where it stands in its
// life, and what a storage place is. The database checks the same lists.

export const SAMPLE_FORMS = ['foil', 'powder', 'wire', 'sputter_cathode', 'gas_cylinder', 'stripper_foil', 'solution', 'other'] as const
export type SampleForm = (typeof SAMPLE_FORMS)[number]

export const FORM_LABELS: Record<SampleForm, string> = {
  foil: 'Foil',
  powder: 'Powder',
  wire: 'Wire',
  sputter_cathode: 'Sputter cathode',
  gas_cylinder: 'Gas cylinder',
  stripper_foil: 'Stripper foil',
  solution: 'Solution',
  other: 'Other',
}

export const SAMPLE_STATUSES = ['quarantined', 'available', 'in_use', 'depleted', 'retired'] as const
export type SampleStatus = (typeof SAMPLE_STATUSES)[number]

/** Statuses a form may set; `retired` is reached only through the retire action. */
export const EDITABLE_STATUSES = ['quarantined', 'available', 'in_use', 'depleted'] as const

export const STATUS_LABELS: Record<SampleStatus, string> = {
  quarantined: 'Quarantined',
  available: 'Available',
  in_use: 'In use',
  depleted: 'Depleted',
  retired: 'Retired',
}

export const LOCATION_KINDS = ['room', 'cabinet', 'shelf'] as const
export type LocationKind = (typeof LOCATION_KINDS)[number]

/** The kind a location's parent must be: rooms stand alone, cabinets in rooms, shelves in cabinets. */
export const PARENT_KIND: Record<LocationKind, LocationKind | null> = { room: null, cabinet: 'room', shelf: 'cabinet' }

export const FRACTION_BASES = ['atom', 'mass'] as const
export type FractionBasis = (typeof FRACTION_BASES)[number]

/** The pattern of a sample code: S-, the year of registration, a six-or-more digit serial. */
export const SAMPLE_CODE_PATTERN = /^S-\d{4}-\d{6,}$/
