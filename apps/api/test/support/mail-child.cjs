// A built API server for the crash test: the real app from dist (build first) with the issued
// report taken from files the test writes (no report is drafted). The test kills this process
// with SIGKILL and starts it again on the same database.
const { copyFileSync, mkdirSync, readFileSync } = require('node:fs');
const { createHash } = require('node:crypto');
const { Readable } = require('node:stream');
const { dirname, join } = require('node:path');

const dist = join(__dirname, '../../../../dist/apps/api/apps/api/src');
require('reflect-metadata');
const { createApp } = require(join(dist, 'app.factory.js'));
const { loadConfig } = require(join(dist, 'config/index.js'));
const { ReportsService } = require(join(dist, 'reports/index.js'));

/**
 * TEST_REPORT_FILE holds {"reportId", "jobId", "pdf"} written by the test after it books the job in.
 * The PDF is put into the local storage (UPLOADS_DIR) under its key, as an issued report is.
 */
function fakeIssued(cfg, shopId, reportId) {
  const r = JSON.parse(readFileSync(process.env.TEST_REPORT_FILE, 'utf8'));
  if (r.reportId !== reportId) return null;
  const bytes = readFileSync(r.pdf);
  const storageKey = `reports/${shopId}/fake-${reportId}.pdf`;
  const path = join(cfg.UPLOADS_DIR, ...storageKey.split('/'));
  mkdirSync(dirname(path), { recursive: true });
  copyFileSync(r.pdf, path);
  return {
    reportId,
    jobId: r.jobId,
    version: 1,
    filename: `bench-report-${reportId}.pdf`,
    contentType: 'application/pdf',
    sha256: createHash('sha256').update(bytes).digest('hex'),
    byteSize: bytes.length,
    storageKey,
    link: null,
    stream: () => Readable.from([bytes]),
    bytes: () => Promise.resolve(bytes),
  };
}

(async () => {
  const cfg = loadConfig();
  const app = await createApp(cfg, { logger: false });
  await app.init();
  const reports = app.get(ReportsService);
  const real = reports.issuedPdf.bind(reports);
  reports.issuedPdf = (shopId, reportId) => fakeIssued(cfg, shopId, reportId) ?? real(shopId, reportId);
  await app.listen(cfg.PORT, '127.0.0.1');
  process.stdout.write('ready\n');
})();
