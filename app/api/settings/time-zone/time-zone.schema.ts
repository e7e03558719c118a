import { z } from "zod";
import { text } from "@/lib/validation/text";
import { isKnownTimeZone } from "@/lib/service/local-dates";

/** The company's time zone: an IANA name this server knows, chosen from the list. */
export const timeZoneSchema = z.object({
  timeZone: text(64, "Choose a time zone from the list.", "Choose a time zone from the list.").refine(isKnownTimeZone, "Choose a time zone from the list; that one isn't known."),
});

export type TimeZoneInput = z.input<typeof timeZoneSchema>;
