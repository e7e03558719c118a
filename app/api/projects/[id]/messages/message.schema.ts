import { z } from "zod";

export const MESSAGE_MAX = 4000;

export const messageSchema = z.object({
  body: z
    .string({ message: "Write a message first." })
    .trim()
    .min(1, "Write a message first.")
    .max(MESSAGE_MAX, `Keep a message under ${MESSAGE_MAX} characters; split a longer one in two.`),
});

export type MessageInput = z.infer<typeof messageSchema>;
