// `npm run worker`: takes Tearline's background jobs in a process of its own, for a deployment that
// runs the app servers with TEARLINE_WORKER=separate. Several workers may run; each job runs once.
import { startJobWorker } from "../lib/jobs/worker";
import { stopBoss } from "../lib/jobs/boss";

async function main() {
  await startJobWorker();
  console.log("Tearline worker: taking mail, digest and photo-sweep jobs. Ctrl-C stops it.");
  const stop = async () => {
    await stopBoss();
    process.exit(0);
  };
  process.on("SIGINT", () => void stop());
  process.on("SIGTERM", () => void stop());
}

void main();
