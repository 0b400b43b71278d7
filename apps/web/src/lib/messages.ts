// Wording shared by forms and notices, without zod, so a notice on a first screen does not pull the form checks in.

/** What the web says when evidence is frozen at hand-over (409 JOB_CLOSED). */
export const JOB_CLOSED_MESSAGE = 'This job was handed over; its records are frozen. A manager can still correct them — every change is recorded.';
