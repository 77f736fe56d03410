// Karma configuration for the Angular client (run through `ng test`, builder @angular/build:karma).
// Runs Debian's chromium headless; as root chromium exits 1 without --no-sandbox.
const fs = require('node:fs');
const path = require('node:path');

process.env.CHROME_BIN ??= '/usr/bin/chromium';

/**
 * Writes `{"suite":"client","passed":N,"failed":N,"skipped":N,"error":bool}` to the file named by
 * KELVINDEX_COUNTS_FILE when the run completes, so that CI can add the client's counts to the
 * API's. A run error (bundle failed to load, browser disconnected) counts as one failure, so
 * that a run which executed nothing can never look green.
 */
function CountsReporter(baseReporterDecorator, logger) {
  baseReporterDecorator(this);
  const log = logger.create('reporter.kelvindex-counts');
  // The base reporter would print the same output as 'progress' a second time.
  this.adapters = [];

  this.onRunComplete = (_browsers, results) => {
    const countsFile = process.env.KELVINDEX_COUNTS_FILE;
    if (!countsFile) {
      return;
    }
    const runError = results.error || results.disconnected;
    const counts = {
      suite: 'client',
      passed: results.success,
      failed: results.failed + (runError ? 1 : 0),
      skipped: results.skipped,
      error: runError,
    };
    fs.mkdirSync(path.dirname(path.resolve(countsFile)), { recursive: true });
    fs.writeFileSync(countsFile, JSON.stringify(counts) + '\n');
    log.info(`counts written to ${countsFile}: ${JSON.stringify(counts)}`);
  };
}
CountsReporter.$inject = ['baseReporterDecorator', 'logger'];

module.exports = function (config) {
  config.set({
    basePath: '',
    frameworks: ['jasmine'],
    plugins: [
      require('karma-jasmine'),
      require('karma-chrome-launcher'),
      { 'reporter:kelvindex-counts': ['type', CountsReporter] },
    ],
    client: {
      jasmine: {
        random: true,
        // A spec without an expectation asserts nothing: fail it.
        failSpecWithNoExpectations: true,
      },
    },
    reporters: ['progress', 'kelvindex-counts'],
    browsers: ['ChromiumHeadlessCI'],
    customLaunchers: {
      ChromiumHeadlessCI: {
        base: 'ChromeHeadless',
        flags: [
          '--no-sandbox',
          '--disable-gpu',
          '--disable-dev-shm-usage',
          '--disable-background-networking',
          '--disable-component-update',
          '--disable-sync',
          '--no-first-run',
          '--disable-quic',
        ],
      },
    },
    // xit/fit leave specs skipped; a skipped spec is a hole in the suite, so fail the run.
    failOnSkippedTests: true,
    failOnEmptyTestSuite: true,
    browserNoActivityTimeout: 60000,
    captureTimeout: 120000,
    singleRun: true,
    restartOnFileChange: true,
  });
};
