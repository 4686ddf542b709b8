import type { Express } from "express";
import type { Writable } from "node:stream";

/** Types for server.js (plain JavaScript so production runs it on `node` alone). */
export function createApp(options?: { buildPath?: string; appUrl?: string; logStream?: Writable }): Promise<Express>;
