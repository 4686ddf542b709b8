import type { Guide } from "../guides/schema";
import { fillRigWords } from "../guides/rig-words";
import { formatDateTime, formatTime } from "../format";
import { answerLabel } from "../vocabulary";

export interface HandoffFacts {
  rig: { code: string; name: string; agitatorMixes?: "forward" | "reverse" };
  guide: { title: string; version: number; definition: Guide };
  openedBy: string | null;
  openedAt: string;
  finalStep: string | null;
  events: { stepId: string; answer: string; at: string; note: string | null }[];
  note: string | null;
  caseUrl: string;
  photoUrls: string[];
  /** The company's zone: every time in the mail is local and names its zone. */
  timeZone: string;
}

const plain = (markdown: string) => markdown.replace(/\*\*|__|`/g, "");

/** The hand-off e-mail to supervisors: what the crew saw and answered, in order. */
export function handoffMail(f: HandoffFacts): { subject: string; text: string } {
  const lines = f.events.map((e) => {
    const prompt = plain(fillRigWords(f.guide.definition.states[e.stepId]?.meta.prompt ?? e.stepId, f.rig));
    return `  ${formatTime(e.at, f.timeZone)}  ${prompt}\n           → ${answerLabel(e.answer)}${e.note ? `  (note: ${e.note})` : ""}`;
  });
  const end = f.finalStep ? plain(f.guide.definition.states[f.finalStep]?.meta.prompt ?? "") : "";
  const text = [
    `${f.openedBy ?? "A crew member"} could not finish "${f.guide.title}" on ${f.rig.code} (${f.rig.name}) and handed it to you.`,
    "",
    end ? `Where it stopped: ${end}` : "",
    f.note ? `Crew note: ${f.note}` : "",
    "",
    `Answers so far (guide version ${f.guide.version}, started ${formatDateTime(f.openedAt, f.timeZone)}):`,
    ...lines,
    "",
    f.photoUrls.length ? `Photos:\n${f.photoUrls.map((u) => `  ${u}`).join("\n")}` : "No photos.",
    "",
    `Open the case: ${f.caseUrl}`,
    "",
    "Tankside does not replace your company's procedures or the maker's manual.",
  ]
    .filter((l, i, all) => !(l === "" && all[i - 1] === ""))
    .join("\n");
  return { subject: `Hand-off: ${f.rig.code} — ${f.guide.title}`, text };
}
