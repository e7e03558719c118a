import { composeEmail, type Email } from "./layout";

/** The e-mail sent once when a tank's cycle gate first opens. */
export function cycleReadyEmail(opts: { companyName: string; name: string; projectTitle: string; url: string; forClient: boolean }): Email {
  const paragraphs = opts.forClient
    ? [
        `Good news about ${opts.projectTitle}: the tank has finished cycling. Ammonia and nitrite have read zero on repeat tests, so the filter's bacteria are established.`,
        `Fish can now go in, a few at a time, with a water test after each batch. We'll be in touch to plan the first batch.`,
      ]
    : [
        `${opts.projectTitle} has passed the cycle gate: ammonia and nitrite read zero on repeat tests under the company's cycle rules.`,
        `The project can move into first stocking. Add fish in small batches and re-test before each new batch.`,
      ];
  return composeEmail({
    companyName: opts.companyName,
    subject: `${opts.projectTitle}: the tank has cycled`,
    greetingName: opts.name,
    paragraphs,
    link: { label: "See the water tests", url: opts.url },
  });
}
