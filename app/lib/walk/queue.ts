import type { Answer, CloseOutcome } from "../vocabulary";

/**
 * What the phone keeps for one walk-through: every answer (with the phone-made id that makes
 * resends harmless), which of them the server has confirmed, and a close waiting to be sent.
 * Storage is passed in (localStorage in the browser, a Map in tests).
 */
export interface QueuedEvent {
  id: string;
  seq: number;
  stepId: string;
  answer: Answer;
  at: string;
  note?: string;
}

export interface QueuedClose {
  outcome: CloseOutcome;
  finalStep?: string;
  engineHours?: number;
  note?: string;
  at: string;
}

/** A fix started with no signal: sent before its answers when there is signal. */
export interface QueuedStart {
  rigCode: string;
  guideSlug: string;
  guideVersionId: number;
  openedAt: string;
  /** A rig card's hour-meter reading as it started. */
  engineHours?: number;
  /** The card this fix was opened from. */
  fromCaseId?: string;
}

/** A photo waiting on the phone (its bytes are kept apart, under its id). */
export interface QueuedPhoto {
  /** Made by the phone; the server stores a resend once. */
  id: string;
  stepId: string;
  name: string;
  bytes: number;
  /** The server's id once stored. */
  sentAs?: number;
  /** Why the server refused it (it is not sent again). */
  error?: string;
}

export interface WalkRecord {
  caseId: string;
  start?: QueuedStart;
  startSent?: boolean;
  events: QueuedEvent[];
  synced: string[];
  photos?: QueuedPhoto[];
  close?: QueuedClose;
  closeResult?: { notified: string[]; mailedAt?: string | null; mailFailed?: boolean; mailPending?: boolean };
  rejected?: string;
}

export interface KeyValueStore {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
}

const key = (caseId: string) => `tankside:walk:${caseId}`;

export function loadRecord(store: KeyValueStore, caseId: string): WalkRecord {
  try {
    const raw = store.getItem(key(caseId));
    if (raw) {
      const parsed = JSON.parse(raw) as WalkRecord;
      if (parsed.caseId === caseId && Array.isArray(parsed.events)) return parsed;
    }
  } catch {
    /* a damaged record is replaced by a fresh one below */
  }
  return { caseId, events: [], synced: [] };
}

export function saveRecord(store: KeyValueStore, record: WalkRecord): void {
  store.setItem(key(record.caseId), JSON.stringify(record));
}

/** Adds what the server already has (e.g. answered on another load of the page), once each. */
export function mergeServerEvents(record: WalkRecord, server: QueuedEvent[]): WalkRecord {
  const have = new Set(record.events.map((e) => e.id));
  const events = [...record.events, ...server.filter((e) => !have.has(e.id))].sort((a, b) => a.seq - b.seq);
  const synced = [...new Set([...record.synced, ...server.map((e) => e.id)])];
  return { ...record, events, synced };
}

export function appendEvent(record: WalkRecord, event: Omit<QueuedEvent, "seq">): WalkRecord {
  const seq = record.events.reduce((m, e) => Math.max(m, e.seq), 0) + 1;
  return { ...record, events: [...record.events, { ...event, seq }] };
}

export const unsynced = (record: WalkRecord) => record.events.filter((e) => !record.synced.includes(e.id));

export const markSynced = (record: WalkRecord, ids: string[]): WalkRecord => ({ ...record, synced: [...new Set([...record.synced, ...ids])] });

/** A close not yet answered, or answered while another request was still sending its hand-off mail (asked again). */
export const closePending = (record: WalkRecord) => !!record.close && (!record.closeResult || !!record.closeResult.mailPending);
