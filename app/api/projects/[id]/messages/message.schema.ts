import { z } from "zod";
import { text } from "@/lib/validation/text";

export const MESSAGE_MAX = 4000;

export const messageSchema = z.object({
  body: text(MESSAGE_MAX, `Keep a message under ${MESSAGE_MAX} characters; split a longer one in two.`, "Write a message first.").min(1, "Write a message first."),
});

export type MessageInput = z.infer<typeof messageSchema>;
