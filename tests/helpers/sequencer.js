// Test order: the rework-risk browser test first, while the test database holds the demo's
// history and nothing else. Later tests add reviews of their own, decided "now", which would
// become the model's held-out 20 % and say nothing about the demo's records.
const Sequencer = require('@jest/test-sequencer').default;

const FIRST = /tests[\\/]e2e[\\/]risk-hint\.test\.ts$/;

class SightlineSequencer extends Sequencer {
  async sort(tests) {
    const sorted = await super.sort(tests);
    return [...sorted.filter((t) => FIRST.test(t.path)), ...sorted.filter((t) => !FIRST.test(t.path))];
  }
}

module.exports = SightlineSequencer;
