// The teacher's price form (issue 18): amounts are typed in major units and sent as integer minor
// units of the studio's currency; an amount with more decimals than the currency has (ISO 4217:
// EUR 2, JPY 0) is refused in the form, and nothing is sent.
import { flushPromises } from '@vue/test-utils'
import { afterEach, describe, expect, it, vi } from 'vitest'
import PricesForm from '../../src/components/billing/PricesForm.vue'
import type { BillingSettings } from '../../src/contract/billing'
import { useBillingStore } from '../../src/stores/billing'
import { mountWithApp } from '../helpers/mount'

afterEach(() => {
  vi.unstubAllGlobals()
  document.body.innerHTML = ''
})

const settings = (over: Partial<BillingSettings> = {}): BillingSettings => ({
  studioId: 'st1',
  studioName: 'Cedar Hollow',
  currency: 'EUR',
  paymentDays: 14,
  currencyLocked: false,
  prices: [{ durationMinutes: 45, amountMinor: 4000 }],
  packages: [],
  ...over,
})

function mountForm(start: BillingSettings) {
  const sent: unknown[] = []
  vi.stubGlobal(
    'fetch',
    vi.fn(async (_url: string, init: RequestInit = {}) => {
      sent.push(JSON.parse(String(init.body)))
      return new Response(JSON.stringify({ settings: start }), {
        headers: { 'content-type': 'application/json' },
      })
    }),
  )
  const { wrapper } = mountWithApp(PricesForm, { attachTo: document.body })
  useBillingStore().settings = start
  return { wrapper, sent }
}

async function typePrice(wrapper: ReturnType<typeof mountForm>['wrapper'], text: string) {
  await flushPromises()
  await wrapper.find('[data-testid="price-0"] input').setValue(text)
  await wrapper.find('form').trigger('submit')
  await flushPromises()
}

describe('PricesForm', () => {
  it('shows the stored price in major units and sends 45.50 EUR as 4550 minor units', async () => {
    const { wrapper, sent } = mountForm(settings())
    await flushPromises()
    expect((wrapper.find('[data-testid="price-0"] input').element as HTMLInputElement).value).toBe(
      '40.00',
    )
    await typePrice(wrapper, '45.50')
    expect(sent).toEqual([
      { currency: 'EUR', paymentDays: 14, prices: [{ durationMinutes: 45, amountMinor: 4550 }] },
    ])
  })

  it.each([
    ['12.345', 'EUR', 'EUR has 2 decimal places.'],
    ['1500.5', 'JPY', 'JPY has no decimal places.'],
  ])('refuses %s %s in the form and sends nothing', async (text, currency, words) => {
    const { wrapper, sent } = mountForm(settings({ currency: currency as 'EUR' }))
    await typePrice(wrapper, text)
    expect(wrapper.find('[data-testid="price-0"]').text()).toContain(words)
    expect(sent).toEqual([])
  })
})
