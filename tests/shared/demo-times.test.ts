import { demoJobs, latestDemoEvent } from '../../seeders/data/demo-jobs';

// The demo is seeded relative to the moment it runs; at any hour, nothing may lie ahead of it.
describe('demo data times', () => {
  const moments = ['2026-12-02T00:00:30Z', '2026-12-02T06:00:00Z', '2026-12-02T12:00:00Z', '2026-12-02T23:59:00Z'];
  it.each(moments)('has no event after the seed time when seeded at %s', (iso) => {
    const now = new Date(iso);
    const jobs = demoJobs(now);
    for (const job of jobs) {
      expect(latestDemoEvent(job)).toBeLessThanOrEqual(now.getTime());
      for (const review of job.reviews) expect(review.decidedAt.getTime()).toBeLessThanOrEqual(now.getTime());
      for (const revision of job.revisions) expect(revision.submittedAt.getTime()).toBeLessThanOrEqual(now.getTime());
    }
  });

  it('keeps the order of each job: submitted before reviewed', () => {
    for (const job of demoJobs(new Date('2026-12-02T00:00:30Z'))) {
      const first = job.revisions[0]?.submittedAt.getTime();
      for (const review of job.reviews.filter((r) => r.revision === 1)) expect(review.decidedAt.getTime()).toBeGreaterThan(first!);
    }
  });
});
