import "server-only";
import Stripe from "stripe";
import { paymentsConfig } from "../env";

let cached: Stripe | null = null;

/** The payment service's SDK client, pointed at PAYMENTS_API_URL when set (the local fake in development and tests). */
export function paymentsClient(): Stripe {
  if (cached) return cached;
  const cfg = paymentsConfig();
  const options: ConstructorParameters<typeof Stripe>[1] = { maxNetworkRetries: 1, timeout: 10_000, telemetry: false };
  if (cfg.apiUrl) {
    const u = new URL(cfg.apiUrl);
    options.host = u.hostname;
    options.port = u.port || (u.protocol === "https:" ? 443 : 80);
    options.protocol = u.protocol === "https:" ? "https" : "http";
  }
  cached = new Stripe(cfg.secretKey, options);
  return cached;
}

/** Verifies a webhook's signature with the SDK and returns the event; throws when it doesn't verify. */
export function verifyWebhook(rawBody: string, signature: string): Stripe.Event {
  return paymentsClient().webhooks.constructEvent(rawBody, signature, paymentsConfig().webhookSecret);
}
