// Runs once when a server process starts.
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  // Sign-in limits key on the socket address; stamp it on each request before any header can pose as it.
  const { stampPeerAddresses } = await import("./lib/security/peer-address-stamp");
  stampPeerAddresses();
  // Background jobs (mail, weekly digest, photo sweep) through the pg-boss queue, unless a
  // separate `npm run worker` process takes them (TEARLINE_WORKER=separate).
  const { startJobWorker, workerRunsInServer } = await import("./lib/jobs/worker");
  if (workerRunsInServer()) void startJobWorker();
}
