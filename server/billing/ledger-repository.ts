// What a student owes and has left per studio (open and paid invoices, lessons of paid packages not
// yet used by attended lessons) and the admin's totals per currency and state.
import type { Db } from '../lib/db'
import type { BillingTotals, LedgerEntry } from '../../src/contract/billing'

// Lessons of a paid package count from its payment for its valid weeks; attended lessons in that
// window that no live invoice bills on their own use them up.
const LEDGER_SQL = `
with packages as (
  select i.studio_id, sum(i.package_lessons)::int as bought, min(i.paid_at) as since,
    max(i.paid_at + make_interval(weeks => i.package_weeks)) as until
  from invoices i
  where i.student_id = :student and i.status = 'paid' and i.package_lessons > 0
    and i.paid_at + make_interval(weeks => i.package_weeks) > now()
  group by i.studio_id
), used as (
  select p.studio_id, count(l.id)::int as used
  from packages p join lessons l on l.studio_id = p.studio_id and l.student_id = :student
    and l.status = 'attended' and l.starts_at >= p.since and l.starts_at < p.until
  where not exists (select 1 from invoice_lines il join invoices i on i.id = il.invoice_id
    where il.lesson_id = l.id and i.status <> 'void')
  group by p.studio_id
), money as (
  select i.studio_id,
    coalesce(sum(i.total_minor) filter (where i.status = 'open'), 0)::int as balance,
    coalesce(sum(i.total_minor) filter (where i.status = 'paid'), 0)::int as paid
  from invoices i where i.student_id = :student and i.status <> 'draft'
  group by i.studio_id
)
select s.id as studio_id, s.name as studio_name, coalesce(b.currency, 'EUR') as currency,
  coalesce(m.balance, 0) as balance, coalesce(m.paid, 0) as paid,
  greatest(coalesce(p.bought, 0) - coalesce(u.used, 0), 0) as lessons_left, p.until
from studio_members sm join studios s on s.id = sm.studio_id
left join studio_billing b on b.studio_id = s.id
left join money m on m.studio_id = s.id
left join packages p on p.studio_id = s.id
left join used u on u.studio_id = s.id
where sm.student_id = :student and (:teacher::uuid is null or s.teacher_id = :teacher::uuid)
order by s.name`

export async function ledgerOf(
  db: Db,
  studentId: string,
  teacherId: string | null,
): Promise<LedgerEntry[]> {
  const { rows } = await db.raw(LEDGER_SQL, { student: studentId, teacher: teacherId })
  return rows.map((r: Record<string, unknown>) => ({
    studioId: r.studio_id,
    studioName: r.studio_name,
    currency: String(r.currency).trim(),
    balanceMinor: r.balance,
    paidMinor: r.paid,
    lessonsLeft: r.lessons_left,
    packageValidUntil: r.until ? (r.until as Date).toISOString() : null,
  })) as LedgerEntry[]
}

/** Counts and sums per currency and state, over all studios (no names, no students). */
export async function billingTotals(db: Db): Promise<BillingTotals[]> {
  const rows = await db('invoices')
    .whereNot({ status: 'draft' })
    .groupBy('currency', 'status')
    .orderBy(['currency', 'status'])
    .select('currency', 'status')
    .count('* as invoices')
    .sum('total_minor as total')
  return rows.map((r) => ({
    currency: String(r.currency).trim(),
    status: r.status,
    invoices: Number(r.invoices),
    totalMinor: Number(r.total),
  })) as BillingTotals[]
}
