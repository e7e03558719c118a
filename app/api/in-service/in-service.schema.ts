import { z } from "zod";
import { optionalText } from "@/lib/validation/text";

/** Page size of the in-service list. */
export const IN_SERVICE_PAGE_SIZE = 25;

/** `?q=` searches title, client and town; `?page=` counts from 1. */
export const inServiceQuerySchema = z.object({
  q: optionalText(100, "Keep the search under 100 characters."),
  page: z
    .string()
    .regex(/^\d{1,5}$/, "Give the page as a whole number from 1.")
    .transform(Number)
    .refine((n) => n >= 1, "Give the page as a whole number from 1.")
    .optional()
    .transform((n) => n ?? 1),
});

export type InServiceQuery = z.infer<typeof inServiceQuerySchema>;
