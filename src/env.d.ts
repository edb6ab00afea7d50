/// <reference types="astro/client" />

declare namespace App {
  interface Locals {
    /** Id of this request: taken from X-Request-Id when the caller sent one, else a new UUID. */
    requestId: string;
  }
}
