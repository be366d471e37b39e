// /api/billing: studio prices and packages, invoices (draft, issue, void, refund, PDF, checkout),
// the ledger and the admin's totals.
import type {
  BillingSettings,
  BillingSettingsInput,
  BillingTotals,
  Invoice,
  InvoiceCreateInput,
  LedgerEntry,
  LessonPackage,
  PackageInput,
} from '../contract/billing'
import { http } from './http'

export type { BillingSettings, BillingTotals, Invoice, LedgerEntry, LessonPackage }

const studio = (id: string) => `/billing/studios/${id}`
const invoice = (id: string) => `/billing/invoices/${id}`

export const fetchSettings = (studioId: string) =>
  http.get<{ settings: BillingSettings }>(studio(studioId))
export const saveSettings = (studioId: string, input: BillingSettingsInput) =>
  http.put<{ settings: BillingSettings }>(studio(studioId), input)
export const addPackage = (studioId: string, input: PackageInput) =>
  http.post<{ package: LessonPackage }>(`${studio(studioId)}/packages`, input)
export const retirePackage = (id: string) => http.delete<void>(`/billing/packages/${id}`)

export const listInvoices = (student?: string) =>
  http.get<{ invoices: Invoice[] }>('/billing/invoices', { query: student ? { student } : {} })
export const draftInvoice = (input: InvoiceCreateInput) =>
  http.post<{ invoice: Invoice }>('/billing/invoices', input)
export const issueInvoice = (id: string) => http.post<{ invoice: Invoice }>(`${invoice(id)}/issue`)
export const voidInvoice = (id: string) => http.post<{ invoice: Invoice }>(`${invoice(id)}/void`)
export const refundInvoice = (id: string) =>
  http.post<{ invoice: Invoice }>(`${invoice(id)}/refund`)
export const deleteDraft = (id: string) => http.delete<void>(invoice(id))
export const startCheckout = (id: string) => http.post<{ url: string }>(`${invoice(id)}/checkout`)

export const fetchLedger = (student?: string) =>
  http.get<{ ledger: LedgerEntry[] }>('/billing/ledger', { query: student ? { student } : {} })
export const fetchTotals = () => http.get<{ totals: BillingTotals[] }>('/billing/totals')

/** The invoice PDF (a plain link carries the session cookie). */
export const invoicePdfUrl = (id: string) => `/api${invoice(id)}/pdf`
