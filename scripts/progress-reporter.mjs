// A vitest reporter that only prints a heartbeat: every 15 s, for each test file still running, its name, how
// long it has run and how many of its tests have finished. The default reporter says nothing until a file ends,
// and some files run for more than a minute.
const EVERY_MS = 15_000;

export default class ProgressReporter {
  running = new Map(); // moduleId -> { name, startedMs, done }
  timer = undefined;

  onTestRunStart() {
    this.timer = setInterval(() => this.beat(), EVERY_MS);
    this.timer.unref?.();
  }

  onTestModuleStart(testModule) {
    const name = testModule.relativeModuleId ?? testModule.moduleId;
    this.running.set(testModule.moduleId, { name, startedMs: Date.now(), done: 0 });
  }

  onTestCaseResult(testCase) {
    const entry = this.running.get(testCase.module?.moduleId);
    if (entry) entry.done += 1;
  }

  onTestModuleEnd(testModule) {
    this.running.delete(testModule.moduleId);
  }

  onTestRunEnd() {
    clearInterval(this.timer);
  }

  beat() {
    const now = Date.now();
    for (const { name, startedMs, done } of this.running.values()) {
      const s = Math.round((now - startedMs) / 1000);
      if (s >= EVERY_MS / 1000) process.stdout.write(`  … still running ${name} (${s} s, ${done} test(s) done)\n`);
    }
  }
}
