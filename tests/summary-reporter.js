// Prints one plain closing line per Jest run ("unit: N passed, N failed, N skipped"), so a
// reader of the CI log sees the count without parsing Jest's own summary.
class SummaryReporter {
  constructor(_globalConfig, options = {}) {
    this.label = options.label ?? 'tests';
  }

  onRunComplete(_contexts, results) {
    const { numPassedTests, numFailedTests, numPendingTests, numRuntimeErrorTestSuites } = results;
    const failed = numFailedTests + numRuntimeErrorTestSuites;
    console.log(`${this.label}: ${numPassedTests} passed, ${failed} failed, ${numPendingTests} skipped`);
  }
}

module.exports = SummaryReporter;
