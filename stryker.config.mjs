// Mutation testing of the trade's rules in lib/ against the unit tests (npm run mutate).
// See DEVELOPERS.md, "Mutation testing".
/** @type {import('@stryker-mutator/api/core').PartialStrykerOptions} */
export default {
  testRunner: "vitest",
  vitest: { configFile: "vitest.unit.config.ts" },
  mutate: ["lib/**/*.ts"],
  coverageAnalysis: "perTest",
  concurrency: 2,
  reporters: ["html", "clear-text", "progress", "json"],
  htmlReporter: { fileName: "reports/mutation/index.html" },
  jsonReporter: { fileName: "reports/mutation/mutation.json" },
  clearTextReporter: { allowColor: false, logTests: false, reportScoreTable: true },
  tempDirName: ".stryker-tmp",
  cleanTempDir: "always",
  // The sandbox needs only what the unit tests import.
  ignorePatterns: [".next", ".data", "reports", "test-results", "playwright-report", "tests/e2e", "tests/integration"],
  timeoutMS: 5000,
  thresholds: { high: 95, low: 90, break: null },
};
