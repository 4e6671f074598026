import type { Reporter, TestModule } from 'vitest/node';

/**
 * Prints one plain closing line, "Summary: N passed, N failed", after Vitest's own summary, so any
 * tool reading the end of the log gets the counts without parsing colours.
 */
export default class SummaryReporter implements Reporter {
  onTestRunEnd(testModules: ReadonlyArray<TestModule>, unhandledErrors: ReadonlyArray<unknown>) {
    let passed = 0;
    let failed = 0;
    let skipped = 0;
    for (const mod of testModules) {
      for (const test of mod.children.allTests()) {
        const state = test.result().state;
        if (state === 'passed') passed++;
        else if (state === 'failed') failed++;
        else skipped++;
      }
      // A file that failed to load counts as a failure even though it has no tests.
      if (mod.state() === 'failed' && [...mod.children.allTests()].length === 0) failed++;
    }
    failed += unhandledErrors.length;
    process.stdout.write(`\nSummary: ${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}\n`);
  }
}
