import { queueSearch } from '../../shared/queue-params';

describe('queueSearch', () => {
  it('keeps valid filters in a stable order and drops the rest', () => {
    expect(queueSearch({ sort: 'due', status: 'submitted,resubmitted', lossType: 'volcano', page: '2', technicianId: '7' })).toBe(
      'status=submitted%2Cresubmitted&technicianId=7&sort=due&page=2&pageSize=25',
    );
  });
});
