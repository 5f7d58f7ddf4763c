// Child-process entry (bundled as dist-server/pglite-create.js): builds and migrates a brand-new PGlite data
// directory, then exits. PGlite builds a new database through a throwaway instance and an in-memory dump, which
// leaves the process at ~830 MB RSS that the JavaScript process never gives back; doing it here, in a process that
// ends, lets the server open the finished directory like any restart (~380 MB). The parent holds the data-directory
// lock for the whole time (db/lock.ts) and passes the directory to build; see createPgliteDir in client.ts.
import { openPglite } from "./client";
import { migrate } from "./migrate";

const [dir, sharedBuffers] = process.argv.slice(2);
if (!dir || !sharedBuffers) {
  process.stderr.write("usage: pglite-create <dir> <shared_buffers>\n");
  process.exit(2);
}
const database = await openPglite(dir, undefined, sharedBuffers);
await migrate(database);
await database.close();
process.exit(0);
