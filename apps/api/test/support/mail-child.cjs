// A built API server for the crash test: the real app from dist (build first) with the issued
// report served from files the test writes, since the reports feature lives on another branch.
// The test kills this process with SIGKILL and starts it again on the same database.
const { readFileSync } = require('node:fs');
const { createHash } = require('node:crypto');
const { Readable } = require('node:stream');
const { join } = require('node:path');

const dist = join(__dirname, '../../../../dist/apps/api/apps/api/src');
require('reflect-metadata');
const { createApp } = require(join(dist, 'app.factory.js'));
const { loadConfig } = require(join(dist, 'config/index.js'));
const { MailService } = require(join(dist, 'mail/index.js'));

/** TEST_REPORT_FILE holds {"reportId", "jobId", "pdf"} written by the test after it books the job in. */
const reportFiles = {
  async getIssuedPdf(_shopId, reportId) {
    const r = JSON.parse(readFileSync(process.env.TEST_REPORT_FILE, 'utf8'));
    if (r.reportId !== reportId) return null;
    const bytes = readFileSync(r.pdf);
    const sha256 = createHash('sha256').update(bytes).digest('hex');
    return {
      reportId,
      jobId: r.jobId,
      version: 1,
      filename: `bench-report-${reportId}.pdf`,
      sha256,
      size: bytes.length,
      link: null,
      open: () => Readable.from([bytes]),
    };
  },
};

(async () => {
  const cfg = loadConfig();
  const app = await createApp(cfg, { logger: false });
  // init first: the reports module binds the real report files at init, and this test's files replace them.
  await app.init();
  app.get(MailService).useReportFiles(reportFiles);
  await app.listen(cfg.PORT, '127.0.0.1');
  process.stdout.write('ready\n');
})();
