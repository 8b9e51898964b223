/** The part of a custody event worth a line on its own: where to, to whom, how much. */
export function custodySummary(kind: string, d: Record<string, any>): string {
  const note = kind !== 'condition' && d.note ? ` — ${d.note}` : ''
  return what(kind, d) + note
}

function what(kind: string, d: Record<string, any>): string {
  if (kind === 'moved') return `: ${d.from?.path ?? 'nowhere'} → ${d.to?.path ?? '—'}`
  if (kind === 'checked_out') return `: to ${holderText(d)} for ${d.run}, due ${formatDate(d.dueBack)}`
  if (kind === 'checked_in') return `: from ${holderText(d)}${d.to?.path ? `, put at ${d.to.path}` : ''}`
  if (kind === 'consumed') {
    const amount = `${formatNumber(d.amount)} ${d.unit === 'cm2' ? 'cm²' : 'mg'}`
    return d.massAfterMg !== null && d.massAfterMg !== undefined && d.massUsedMg !== null ? `: ${amount}, ${formatNumber(d.massAfterMg)} mg left` : `: ${amount}${d.unchanged ? ` (${d.unchanged})` : ''}`
  }
  if (kind === 'condition') return `: ${d.note}`
  return ''
}

/** A holder as a line of text: the person's name, an external user with their institution. */
export function holderText(k: { holder?: string; holderInstitution?: string | null }): string {
  return k.holderInstitution ? `${k.holder} (${k.holderInstitution})` : (k.holder ?? '—')
}
