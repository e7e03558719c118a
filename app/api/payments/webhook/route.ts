import { NextResponse } from "next/server";
import type Stripe from "stripe";
import { publicRoute } from "@/server/route";
import { badRequest } from "@/server/errors";
import { verifyWebhook } from "@/server/payments";
import { processPaymentEvent } from "@/db/queries/payments";

/**
 * The payment service's webhook: the only thing that marks a card payment paid. Its signature is
 * the credential, checked with the SDK over the raw body; a bad one is a 400 and changes nothing.
 */
export const POST = publicRoute({}, async ({ req }) => {
  const signature = req.headers.get("stripe-signature");
  if (!signature) throw badRequest("The webhook's signature header is missing; nothing was changed.");
  const raw = await req.text();
  let event: Stripe.Event;
  try {
    event = verifyWebhook(raw, signature);
  } catch (error) {
    if (error instanceof SyntaxError) throw badRequest("The webhook's body isn't an event; nothing was changed.");
    throw badRequest("The webhook's signature doesn't verify; nothing was changed.");
  }
  const result = await processPaymentEvent(event);
  return NextResponse.json({ received: true, ...result });
});
