import { composeEmail, type Email } from "./layout";
import { STAGE_BLURBS, STAGE_LABELS, stageIndex, type Stage } from "../stages/stages";

/** The e-mail a stage change sends to the client and the lead. */
export function stageChangeEmail(opts: {
  companyName: string;
  recipientName: string;
  forClient: boolean;
  projectTitle: string;
  fromStage: Stage;
  toStage: Stage;
  byName: string;
  override: boolean;
  reason: string | null;
  url: string;
}): Email {
  const back = stageIndex(opts.toStage) < stageIndex(opts.fromStage);
  const paragraphs = [
    back
      ? `${opts.projectTitle} has moved back from ${STAGE_LABELS[opts.fromStage]} to ${STAGE_LABELS[opts.toStage]}.`
      : `${opts.projectTitle} has moved on from ${STAGE_LABELS[opts.fromStage]} to ${STAGE_LABELS[opts.toStage]}.`,
  ];
  if (opts.forClient) paragraphs.push(`What this stage means: ${STAGE_BLURBS[opts.toStage]}`);
  if (opts.override) paragraphs.push(`The project lead passed this step's check by decision${opts.reason ? `: ${opts.reason}` : "."}`);
  else if (opts.reason) paragraphs.push(`Reason given: ${opts.reason}`);
  paragraphs.push(`Changed by ${opts.byName}.`);
  return composeEmail({
    companyName: opts.companyName,
    subject: `${opts.projectTitle}: now in ${STAGE_LABELS[opts.toStage]}`,
    greetingName: opts.recipientName,
    paragraphs,
    link: { label: "Open the project", url: opts.url },
  });
}
