#!/usr/bin/env node
// Calls the reminder job of the local app on an interval (the start command runs it beside the
// server; production uses its own scheduler). The secret goes in a header, never in the URL.
const base = process.argv[2] ?? `http://127.0.0.1:${process.env.PORT || 3000}`;
const everyS = Number(process.env.REMINDER_INTERVAL_S || 3600);
const secret = process.env.JOBS_SECRET;
if (!secret) {
  console.error("reminder-loop: JOBS_SECRET is not set; not running.");
  process.exit(0);
}

async function run() {
  try {
    const res = await fetch(`${base}/api/jobs/reminders`, { method: "POST", headers: { "x-presswright-job-secret": secret } });
    const body = await res.json().catch(() => ({}));
    console.log(`reminder-loop: ${res.status} ${JSON.stringify(body)}`);
  } catch (error) {
    console.error(`reminder-loop: ${error.message}`);
  }
}

setTimeout(run, 10_000);
setInterval(run, everyS * 1000);
