/// <reference types="astro/client" />

declare namespace App {
  interface Locals {
    /**
     * Id of this request: the caller's X-Request-Id when sane, else a new UUID (set by the server,
     * src/lib/server/access-log.ts). Returned as X-Request-Id and logged as `reqId` on every line
     * written while the request is handled, so a user's report can be matched to the logs.
     */
    requestId: string;
    /**
     * The signed-in person, resolved once per request by the middleware from the database
     * session; null when signed out, and always null on routes the table marks 'anyone' without
     * session: 'optional' (public calculators, /api/v1, static pages skip the lookup).
     * staffRole is our own staff marker: 'support' or 'admin' staff, else null.
     */
    user: {
      id: string;
      email: string;
      name: string | null;
      staffRole: 'support' | 'admin' | null;
      /**
       * The unit system they last picked on any device (src/lib/data/users.ts), or null when they
       * never have; pages put it on <html data-account-units> so every device starts on it.
       */
      unitSystem: 'metric' | 'us' | null;
    } | null;
    /**
     * The organisation the user is working in: the one in the dw_org cookie if they belong to it,
     * else their oldest company membership, else their personal free workspace. null when signed
     * out or (staff) a member of none. Every org-scoped query takes organisation.id.
     */
    organisation: {
      id: string;
      name: string;
      plan: 'free' | 'pro';
      /** True for a user's own one-person workspace, made at first sign-in. */
      personal: boolean;
    } | null;
    /** The user's role in `organisation`: 'owner' or 'member'; null when organisation is null. */
    role: 'owner' | 'member' | null;
  }
}
