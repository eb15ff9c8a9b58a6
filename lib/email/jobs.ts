/** The reminder job's secret travels in this header, never in the query string (logs keep URLs). */
export const JOB_SECRET_HEADER = "x-presswright-job-secret";
