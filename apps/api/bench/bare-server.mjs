// Baseline for the media upload benchmark: the least a Node server can do with an
// upload — stream the request body to a file and answer 204.
import { createWriteStream } from 'node:fs';
import { createServer } from 'node:http';
import { join } from 'node:path';
import { pipeline } from 'node:stream/promises';

const dir = process.env.BARE_DIR;
let n = 0;
const server = createServer(async (req, res) => {
  try {
    await pipeline(req, createWriteStream(join(dir, `upload-${n++}`)));
    res.writeHead(204).end();
  } catch (err) {
    res.writeHead(500).end(String(err));
  }
});
server.listen(0, '127.0.0.1', () => process.send?.({ port: server.address().port }));
