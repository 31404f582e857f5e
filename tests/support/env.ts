// Where the running test services are; scripts/test.sh exports these.
export const APP_URL = process.env.APP_URL ?? "http://127.0.0.1:3100";
export const MAIL_FAKE_URL = process.env.MAIL_FAKE_URL ?? "http://127.0.0.1:8035";
export const CHROMIUM_PATH = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
export const servicesRunning = Boolean(process.env.DATABASE_URL && process.env.APP_URL);
