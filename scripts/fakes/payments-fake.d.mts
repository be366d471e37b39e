export interface PaymentsFake {
  url: string
  secretKey: string
  webhookSecret: string
  events: { id: string; type: string; created: number; data: { object: Record<string, unknown> } }[]
  setWebhookUrl(url: string): void
  close(): Promise<void>
}
export function signPayload(payload: string, secret: string, timestamp?: number): string
export function startPaymentsFake(options?: {
  port?: number
  secretKey?: string
  webhookSecret?: string
  webhookUrl?: string
}): Promise<PaymentsFake>
export function startLocalPayments(
  appUrl: string,
  env?: NodeJS.ProcessEnv,
): Promise<{ env: Record<string, string>; close(): Promise<void> }>
