// Runs once when a server process starts: background timers that belong to the whole app.
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  // Sign-in limits key on the socket address; stamp it on each request before any header can pose as it.
  const { stampPeerAddresses } = await import("./lib/security/peer-address-stamp");
  stampPeerAddresses();
  // Mail that could not be sent is retried every MAIL_RETRY_MS (30 s unless set).
  const { startMailRetryLoop } = await import("./lib/mail/retry-loop");
  startMailRetryLoop();
  // The weekly digest to managers: checked once an hour, sent when due.
  const { startDigestSchedule } = await import("./lib/digest/schedule");
  startDigestSchedule();
  // Photo objects left without a row by a crash mid-upload: swept once an hour.
  const { startPhotoSweepSchedule } = await import("./lib/photos/sweep-schedule");
  startPhotoSweepSchedule();
}
