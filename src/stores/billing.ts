// Billing: the teacher's studio prices, packages and invoices; the student's invoices and ledger;
// the admin's totals. Invoices are replaced in place after each action.
import { defineStore } from 'pinia'
import { ref, type Ref } from 'vue'
import * as billingApi from '../api/billing'
import type { BillingSettingsInput, InvoiceCreateInput, PackageInput } from '../contract/billing'
import { useLoadState } from './load-state'

type Track = ReturnType<typeof useLoadState>['track']

/** What a teacher and a student do with invoices; each answer replaces the invoice in the list. */
function invoiceActions(invoices: Ref<billingApi.Invoice[]>, track: Track) {
  const replace = (invoice: billingApi.Invoice) =>
    (invoices.value = invoices.value.map((i) => (i.id === invoice.id ? invoice : i)))
  const act = (call: (id: string) => Promise<{ invoice: billingApi.Invoice }>) => (id: string) =>
    track(async () => void replace((await call(id)).invoice))
  return {
    draft: (input: InvoiceCreateInput) =>
      track(async () => {
        const { invoice } = await billingApi.draftInvoice(input)
        invoices.value = [invoice, ...invoices.value]
      }),
    issue: act(billingApi.issueInvoice),
    voidInvoice: act(billingApi.voidInvoice),
    refund: act(billingApi.refundInvoice),
    removeDraft: (id: string) =>
      track(async () => {
        await billingApi.deleteDraft(id)
        invoices.value = invoices.value.filter((i) => i.id !== id)
      }),
    /** Opens the payment service's hosted checkout for the invoice (leaves the app). */
    pay: (id: string) =>
      track(async () => window.location.assign((await billingApi.startCheckout(id)).url)),
  }
}

export const useBillingStore = defineStore('billing', () => {
  const { isLoading, error, load, track } = useLoadState()
  const settings = ref<billingApi.BillingSettings | null>(null)
  const invoices = ref<billingApi.Invoice[]>([])
  const ledger = ref<billingApi.LedgerEntry[]>([])
  const totals = ref<billingApi.BillingTotals[]>([])

  return {
    ...{ settings, invoices, ledger, totals, isLoading, error },
    loadTeacher: (studioId: string) =>
      load(async () => {
        const [s, list] = await Promise.all([
          billingApi.fetchSettings(studioId),
          billingApi.listInvoices(),
        ])
        settings.value = s.settings
        invoices.value = list.invoices.filter((i) => i.studioId === studioId)
      }),
    loadStudent: () =>
      load(async () => {
        const [list, account] = await Promise.all([
          billingApi.listInvoices(),
          billingApi.fetchLedger(),
        ])
        invoices.value = list.invoices
        ledger.value = account.ledger
      }),
    loadTotals: () =>
      load(async () => void (totals.value = (await billingApi.fetchTotals()).totals)),
    saveSettings: (input: BillingSettingsInput) =>
      track(async () => {
        settings.value = (await billingApi.saveSettings(settings.value!.studioId, input)).settings
      }),
    addPackage: (input: PackageInput) =>
      track(async () => {
        const added = (await billingApi.addPackage(settings.value!.studioId, input)).package
        settings.value!.packages = [...settings.value!.packages, added]
      }),
    retirePackage: (id: string) =>
      track(async () => {
        await billingApi.retirePackage(id)
        settings.value!.packages = settings.value!.packages.filter((p) => p.id !== id)
      }),
    ...invoiceActions(invoices, track),
  }
})
