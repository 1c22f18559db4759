import { describeReworkDue } from '../../shared/jobs';

describe('describeReworkDue', () => {
  const now = new Date('2026-12-02T12:00:00Z');
  it('says how long is left, in words', () => {
    expect(describeReworkDue('2026-12-03T08:00:00Z', now)).toEqual({ overdue: false, text: 'Rework due in 20 hours' });
  });
  it('says how late it is once the deadline has passed', () => {
    expect(describeReworkDue('2026-12-02T09:00:00Z', now)).toEqual({ overdue: true, text: 'Rework overdue by 3 hours' });
  });
});
