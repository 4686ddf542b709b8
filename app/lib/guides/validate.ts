import type { Cause } from "./causes";
import { findDuplicateKeys } from "./duplicate-keys";
import { reachable, stepsToEnd } from "./graph";
import { ANSWER_LABELS, ANSWERS_BY_KIND, type StepAnswer } from "../vocabulary";
import { guideSchema, isFinalKind, STEP_KINDS, type Guide, type StepKind } from "./schema";
import { CORE_STOP, restartsWithoutReturnToService, sendsInsideTank, soundsEnergizing, unguardedSteps } from "./safety";
import { RIG_WORDS, unknownRigWords } from "./rig-words";

export interface GuideProblem {
  guide: string;
  step?: string;
  message: string;
}

export interface ValidationResult {
  guide: Guide | null;
  problems: GuideProblem[];
  /** Allowed, but a reviewer should look (a restart with no return-to-service step before it). */
  warnings: GuideProblem[];
}

export const describeProblem = (p: GuideProblem) => `${p.guide}${p.step ? ` › step "${p.step}"` : ""}: ${p.message}`;

type Loose = Record<string, unknown>;
const isObject = (v: unknown): v is Loose => typeof v === "object" && v !== null && !Array.isArray(v);

/** Line and column for a character offset, for parser messages that give only a position. */
function lineColumn(text: string, offset: number): string {
  const before = text.slice(0, offset).split("\n");
  return `line ${before.length}, column ${before[before.length - 1].length + 1}`;
}

/**
 * Checks a guide file (its text or the parsed value) against the format and every
 * structural rule, and returns all problems at once. Never throws.
 */
export interface ValidateOptions {
  causes: Cause[];
  name?: string;
  /** The guides a card may open (when known: the library being checked, or the company's usable guides). */
  guideIds?: readonly string[];
}

export function validateGuide(input: unknown, options: ValidateOptions): ValidationResult {
  try {
    return validate(input, options);
  } catch (error) {
    return { guide: null, problems: [{ guide: options.name ?? "guide", message: `could not be checked: ${String(error)}` }], warnings: [] };
  }
}

function validate(input: unknown, { causes, name, guideIds }: ValidateOptions): ValidationResult {
  const problems: GuideProblem[] = [];
  const warnings: GuideProblem[] = [];
  let raw: unknown = input;
  if (typeof input === "string") {
    try {
      raw = JSON.parse(input);
    } catch (error) {
      const message = error instanceof Error ? error.message : String(error);
      const at = /position (\d+)/.exec(message);
      const where = at && !/line \d+/.test(message) ? ` (${lineColumn(input, Number(at[1]))})` : "";
      return { guide: null, problems: [{ guide: name ?? "guide", message: `is not valid JSON: ${message}${where}` }], warnings: [] };
    }
  }
  const guideName = (isObject(raw) && typeof raw.id === "string" && raw.id) || name || "guide";
  const add = (message: string, step?: string) => problems.push({ guide: guideName, step, message });

  if (!isObject(raw)) {
    add("must be a JSON object with id, title, summary, symptoms, initial and states");
    return { guide: null, problems, warnings };
  }
  if (typeof input === "string") {
    for (const d of findDuplicateKeys(input)) {
      if (d.path.length === 1 && d.path[0] === "states") add(`step id "${d.key}" is used twice`, d.key);
      else add(`field "${d.key}" appears twice${d.path.length ? ` in ${d.path.join(" › ")}` : ""}`);
    }
  }

  const parsed = guideSchema.safeParse(raw);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const [top, stepId, ...rest] = issue.path.map(String);
      if (top === "translations") {
        // translations.es.steps.<id>.prompt → the Spanish prompt of that step, said as a trainer reads it.
        const [, lang, part, id, field] = issue.path.map(String);
        const language = LANGUAGE_WORDS[lang] ?? lang;
        if (part === "steps" && id !== undefined) add(`${language} ${field ?? "text"}: ${issue.message}`, id);
        else add(`${language} ${part ?? "text"}: ${issue.message}`);
        continue;
      }
      const inStep = top === "states" && stepId !== undefined;
      const field = (inStep ? rest : [top, stepId, ...rest]).filter((x) => x !== undefined).join(".");
      let message = issue.message;
      if (issue.code === "unrecognized_keys")
        message = `unknown field${issue.keys.length > 1 ? "s" : ""} ${issue.keys.map((k) => `"${k}"`).join(", ")}${field ? ` in ${field}` : ""}`;
      else if (/received undefined/.test(message)) message = `missing field "${field}"`;
      else if (field) message = `${field}: ${message}`;
      add(message, inStep ? stepId : undefined);
    }
  }

  checkStructure(raw, causes, add, (message, step) => warnings.push({ guide: guideName, step, message }));
  checkTranslations(raw, add);
  if (guideIds && isObject(raw.states)) {
    for (const [id, s] of Object.entries(raw.states)) {
      const target = isObject(s) && isObject(s.meta) ? s.meta.opensGuide : undefined;
      if (typeof target === "string" && !guideIds.includes(target)) add(`opens guide "${target}", which is not a guide in the library`, id);
    }
  }
  return { guide: problems.length === 0 && parsed.success ? parsed.data : null, problems, warnings };
}

/** The graph rules, on whatever part of the file is shaped well enough to read. */
function checkStructure(raw: Loose, causes: Cause[], add: (message: string, step?: string) => void, warn: (message: string, step?: string) => void) {
  if (!isObject(raw.states)) return;
  const steps: Guide["states"] = {};
  for (const [id, s] of Object.entries(raw.states)) {
    if (!isObject(s) || !isObject(s.meta) || !STEP_KINDS.includes(s.meta.kind as StepKind)) continue;
    const on = isObject(s.on) ? (Object.fromEntries(Object.entries(s.on).filter(([, t]) => typeof t === "string")) as Record<string, string>) : undefined;
    steps[id] = { type: s.type === "final" ? "final" : undefined, on, meta: s.meta as Guide["states"][string]["meta"] };
  }
  const initial = typeof raw.initial === "string" ? raw.initial : "";
  const guide = { initial, states: steps } as Guide;
  const card = raw.kind === "card";
  const causeCodes = new Set(causes.map((c) => c.code));

  if (initial && !(initial in raw.states)) add(`initial step "${initial}" is not one of the steps`);

  for (const [id, step] of Object.entries(steps)) {
    const kind = step.meta.kind;
    const needed: readonly string[] = ANSWERS_BY_KIND[kind];
    const given = Object.keys(step.on ?? {});
    for (const event of needed) if (!given.includes(event)) add(`a ${kind} step needs a ${event} answer`, id);
    for (const event of given) {
      if (!needed.includes(event)) {
        add(
          needed.length ? `a ${kind} step answers ${needed.join(" or ")}, not ${event}` : `a ${kind} step is an end and takes no answers (found ${event})`,
          id,
        );
      }
    }
    for (const [event, target] of Object.entries(step.on ?? {})) {
      if (!(target in raw.states)) add(`answer ${event} points at "${target}", which is not a step`, id);
    }
    if (isFinalKind(kind) && step.type !== "final") add(`a ${kind} step is an end: give it "type": "final"`, id);
    if (!isFinalKind(kind) && step.type === "final") add(`only fixed and handoff steps are ends; a ${kind} step cannot be "type": "final"`, id);
    if (kind === "safety" && step.meta.handsOn) add("a safety step is the shut-down stop itself and cannot be hands-on", id);
    if (kind === "safety" && step.meta.energizes) add("a safety step shuts the rig down; it cannot also put energy back", id);
    if (!step.meta.energizes && kind !== "safety" && !isFinalKind(kind) && typeof step.meta.prompt === "string" && soundsEnergizing(step.meta.prompt)) {
      add("says it restarts or runs the rig, so tick “puts energy back”: a stop before it ends there", id);
    }
    if (step.meta.energizes && step.meta.handsOn) add("puts energy back and is hands-on: split it into the hands-on work and then the restart", id);
    if (step.meta.checklist?.length && kind !== "safety") add("only a safety step carries a checklist", id);
    if (kind === "safety" && Array.isArray(step.meta.checklist) && step.meta.checklist.length) {
      const left = CORE_STOP.filter((i) => !step.meta.checklist!.includes(i));
      if (left.length) add(`a safety step's checklist must include ${left.map((i) => `"${i}"`).join(", ")}: without them nothing is shut down`, id);
    }
    if (step.meta.hazards?.length && !step.meta.handsOn) add("only a hands-on step names hazards", id);
    if (step.meta.returnsToService && (kind !== "task" || step.meta.handsOn))
      add("a return-to-service step is a task done before the restart, not hands-on work", id);
    const text = `${step.meta.prompt ?? ""} ${step.meta.help ?? ""}`;
    for (const name of unknownRigWords(text))
      add(
        `{{${name}}} is not a rig word: use ${Object.keys(RIG_WORDS)
          .map((w) => `{{${w}}}`)
          .join(" or ")}`,
        id,
      );
    if (sendsInsideTank(text)) add("sends someone inside the tank: reach the part from outside (hatch, drain, pole) or send the job to the shop", id);
    checkCardFields(step.meta, card, add, id);
    if (card) {
      // A card's ends say whether the routine is complete; faults and their causes belong to guides.
      if (step.meta.cause) add("a rig card's steps carry no cause: a fault found on a card opens a guide (opensGuide)", id);
    } else if (kind === "fixed") {
      if (!step.meta.cause) add("a fixed step needs a cause code", id);
      else if (!causeCodes.has(step.meta.cause)) add(`cause "${step.meta.cause}" is not in the cause list`, id);
      if (!step.meta.component) add("a fixed step needs a component", id);
    } else if (kind === "handoff") {
      // A hand-off's cause is what the crew suspects; the shop confirms it.
      if (step.meta.cause && !causeCodes.has(step.meta.cause)) add(`suspected cause "${step.meta.cause}" is not in the cause list`, id);
    } else if (step.meta.cause) {
      add(`only fixed and hand-off steps carry a cause (found "${step.meta.cause}" on a ${kind} step)`, id);
    }
  }

  if (!Object.values(steps).some((s) => s.meta.kind === "fixed")) add(card ? "the card has no complete (fixed) end" : "the guide has no fixed end");
  if (!(initial in steps)) return;

  const fromStart = reachable(guide, initial);
  for (const id of Object.keys(raw.states)) if (id in steps && !fromStart.has(id)) add("cannot be reached from the first step", id);

  const left = stepsToEnd(guide);
  for (const id of fromStart) if (left[id] === Infinity) add("no fixed or handoff end can be reached from here", id);

  // On every path to a hands-on step, a stop since the last restart that covers what the step exposes.
  for (const f of unguardedSteps(guide)) add(f.message, f.step);
  for (const f of restartsWithoutReturnToService(guide)) warn(f.message, f.step);
}

const LANGUAGE_WORDS: Record<string, string> = { es: "Spanish" };

/** Translated text names real steps and uses only rig words (the stop rules live on the English steps they translate). */
function checkTranslations(raw: Loose, add: (message: string, step?: string) => void) {
  if (!isObject(raw.translations) || !isObject(raw.states)) return;
  for (const [lang, t] of Object.entries(raw.translations)) {
    if (!isObject(t) || !isObject(t.steps)) continue;
    for (const [id, tr] of Object.entries(t.steps)) {
      if (!(id in raw.states)) {
        add(`the ${LANGUAGE_WORDS[lang] ?? lang} text names step "${id}", which is not a step`);
        continue;
      }
      if (!isObject(tr)) continue;
      const text = `${typeof tr.prompt === "string" ? tr.prompt : ""} ${typeof tr.help === "string" ? tr.help : ""}`;
      for (const name of unknownRigWords(text))
        add(
          `the ${LANGUAGE_WORDS[lang] ?? lang} text uses {{${name}}}, which is not a rig word: use ${Object.keys(RIG_WORDS)
            .map((w) => `{{${w}}}`)
            .join(" or ")}`,
          id,
        );
    }
  }
}

/** Day facts, services and guides to open: which step of which kind may carry them. */
function checkCardFields(meta: Guide["states"][string]["meta"], card: boolean, add: (message: string, step?: string) => void, id: string) {
  const answering = meta.kind === "check" || meta.kind === "task";
  if (meta.service && (!card || !answering)) add("only a rig card's check or task records a service", id);
  if (meta.opensGuide && (!card || meta.kind !== "task")) add("only a rig card's task opens a guide (its Done means sorted, carry on)", id);
  if (meta.dayCheck && (card ? !answering : meta.kind !== "check"))
    add(card ? "a card's day fact sits on a check or a task" : "a guide asks about today's card only on a check step", id);
}

const FIELD_WORDS: Record<string, string> = {
  prompt: "the question or instruction",
  help: "the help text",
  minutes: "the minutes",
  cause: "the cause",
  component: "the part",
};

/** A checker message in a trainer's words: no schema paths ("meta.prompt: …"), answers by their labels. */
export function plainProblem(message: string): string {
  return message
    .replace(/^meta\.(\w+): /, (_m, field: string) => `${FIELD_WORDS[field] ?? field}: `)
    .replace(/\banswer (YES|NO|DONE|CANT|ACK)\b/g, (_m, a: StepAnswer) => `the “${ANSWER_LABELS[a]}” answer`)
    .replace(/"([^"]*)"/g, "“$1”");
}
