import { fireEvent, render, screen } from '@testing-library/react';

import { FindingsPanel } from '@/components/capture-record/findings-panel';
import { CriterionRow } from '@/components/review/criterion-row';
import { ScoreSummary } from '@/components/review/score-summary';
import { DEFAULT_RUBRIC } from '@/shared/default-rubric';

const spacing = DEFAULT_RUBRIC.criteria.find((c) => c.key === 'spacing')!;

describe('FindingsPanel', () => {
  it('says in words what blocks submission and what only warns', () => {
    render(
      <FindingsPanel
        findings={{
          missing: [{ field: 'processing.confirmed', message: 'Confirm processing.' }],
          warnings: [{ field: 'rooms.0.doorwayStation', message: 'Kitchen: no doorway station.' }],
        }}
      />,
    );
    expect(screen.getByText('Missing before you can submit (1)')).toBeInTheDocument();
    expect(screen.getByText('✕ Confirm processing.')).toBeInTheDocument();
    expect(screen.getByText('Warnings (1): you can still submit')).toBeInTheDocument();
  });

  it('says when nothing is wrong', () => {
    render(<FindingsPanel findings={{ missing: [], warnings: [] }} />);
    expect(screen.getByText('✓ Nothing missing, no warnings.')).toBeInTheDocument();
  });
});

describe('ScoreSummary', () => {
  it('explains which rule failed', () => {
    render(
      <ScoreSummary
        passMark={85}
        evaluation={{
          complete: true,
          score: 70,
          passed: false,
          failedRules: ['Score 70.0 is below the pass mark of 85.'],
          criticalFailures: [],
        }}
      />,
    );
    expect(screen.getByText('70.0')).toBeInTheDocument();
    expect(screen.getByText('Fails')).toBeInTheDocument();
    expect(screen.getByText('✕ Score 70.0 is below the pass mark of 85.')).toBeInTheDocument();
  });
});

describe('CriterionRow', () => {
  it('asks for a comment and offers stock reasons only below full marks', () => {
    const onChange = jest.fn();
    const { rerender } = render(
      <CriterionRow
        criterion={spacing}
        applies
        entry={{ score: 4, stockReason: null, comment: '' }}
        current={false}
        onChange={onChange}
        onFocus={() => undefined}
      />,
    );
    expect(screen.queryByLabelText(`Comment for ${spacing.title}`)).toBeNull();
    fireEvent.click(screen.getByLabelText(`${spacing.title}: 2: ${spacing.scale.kind === 'levels' ? spacing.scale.levels[2] : ''}`));
    expect(onChange).toHaveBeenCalledWith({ score: 2, stockReason: null, comment: '' });
    rerender(
      <CriterionRow
        criterion={spacing}
        applies
        entry={{ score: 2, stockReason: null, comment: '' }}
        current={false}
        onChange={onChange}
        onFocus={() => undefined}
      />,
    );
    expect(screen.getByLabelText(`Comment for ${spacing.title}`)).toBeInTheDocument();
    expect(screen.getByLabelText('No doorway station')).toBeInTheDocument();
  });

  it('offers station-analysis suggestions as a comment, without scoring', () => {
    const onChange = jest.fn();
    render(
      <CriterionRow
        criterion={spacing}
        applies
        entry={{ score: 3, stockReason: null, comment: '' }}
        current
        suggestions={['Ground floor: station #4 is far.']}
        onChange={onChange}
        onFocus={() => undefined}
      />,
    );
    fireEvent.click(screen.getByLabelText(`Use the suggested comments for ${spacing.title}`));
    expect(onChange).toHaveBeenCalledWith({ score: 3, stockReason: null, comment: 'Ground floor: station #4 is far.' });
  });

  it('says when a criterion does not apply', () => {
    render(
      <CriterionRow
        criterion={spacing}
        applies={false}
        entry={{ score: null, stockReason: null, comment: '' }}
        current={false}
        onChange={() => undefined}
        onFocus={() => undefined}
      />,
    );
    expect(screen.getByText('Not applicable to this record: left out of the score.')).toBeInTheDocument();
  });
});
