/// <reference types="astro/client" />

declare namespace App {
  interface Locals {
    /** The signed-in person, or null (set by src/middleware.ts on every request but static files and calculations). */
    user: import('./lib/auth/session-user').SessionUser | null;
    /** Id of the current better-auth session, or null. */
    sessionId: string | null;
  }
}
