import { describeEvent } from '../../shared/timeline';

describe('describeEvent', () => {
  it('puts a review decision in words', () => {
    expect(describeEvent({ type: 'reviewed', data: { decision: 'rework', score: 78.5, rubricVersion: 2, revision: 1 } })).toBe(
      'Reviewed: Request rework, score 78.5 (rubric version 2, revision 1)',
    );
  });

  it('names the e-mail kinds', () => {
    expect(describeEvent({ type: 'email_sent', data: { kind: 'rework_request' } })).toBe('E-mail sent: rework request');
  });
});
