import { fireEvent, render, screen } from '@testing-library/react';

import { ChangesPanel } from '@/components/review/changes-panel';
import { CriterionRow } from '@/components/review/criterion-row';
import DataTableView from '@/components/ui/data-table-view';
import { DEFAULT_RUBRIC } from '@/shared/default-rubric';
import { diffRevisions } from '@/shared/revision-diff';

import { completeRecord, room } from '../helpers/records';

const spacing = DEFAULT_RUBRIC.criteria.find((c) => c.key === 'spacing')!;

describe('CriterionRow stock reasons', () => {
  it('fills the comment with the chosen reason as editable text', () => {
    const onChange = jest.fn();
    render(
      <CriterionRow
        criterion={spacing}
        applies
        entry={{ score: 2, stockReason: null, comment: '' }}
        current={false}
        onChange={onChange}
        onFocus={() => undefined}
      />,
    );
    fireEvent.click(screen.getByLabelText('No doorway station'));
    expect(onChange).toHaveBeenCalledWith({ score: 2, stockReason: 'No doorway station', comment: 'No doorway station.' });
  });
});

describe('ChangesPanel', () => {
  it("lists changes under the form's sections in its words, with file names and a thumbnail for a new photo", () => {
    const bathroom = room({ key: 'r2', name: 'Bathroom', reflective: [{ kind: 'mirror', found: 1, flagged: 0 }] });
    const files = [{ id: 7, name: 'mirror.jpg', contentType: 'image/jpeg' }];
    const changes = diffRevisions(
      { record: completeRecord({ rooms: [bathroom] }), files: [] },
      { record: completeRecord({ rooms: [{ ...bathroom, reflective: [{ kind: 'mirror', found: 1, flagged: 1 }] }] }), files },
    );
    render(
      <ChangesPanel
        currentRevision={2}
        files={files}
        previous={{
          revision: 1,
          score: 80,
          decision: 'rework',
          changes,
          carried: {},
          items: [
            {
              id: 1,
              criterionKey: 'reflective',
              title: 'Reflective surfaces',
              instruction: 'Flag the bathroom mirror',
              stockReason: null,
              response: 'fixed',
              responseNote: 'Flagged it',
              responseFileIds: [7],
              respondedAt: null,
              disputeOutcome: null,
              disputeNote: null,
            },
          ],
        }}
      />,
    );
    expect(screen.getByRole('group', { name: 'Changes in Rooms' })).toHaveTextContent('Bathroom · Mirror flagged: was 0, now 1');
    expect(screen.getByRole('group', { name: 'Changes in Files' })).toHaveTextContent('Added: File attached (mirror.jpg)');
    expect(screen.getByLabelText('Preview of mirror.jpg')).toBeInTheDocument();
    expect(screen.getByText('Files attached to the answer: mirror.jpg (see Files)')).toBeInTheDocument();
    expect(document.body.textContent).not.toMatch(/rooms\.|"kind"|#7/);
  });
});

describe('DataTableView cards', () => {
  // jsdom's window is 1024 px wide: a threshold above it gives cards, none gives a table.
  const rows = [{ id: 1, claim: 'MRK-26-1001', status: 'Submitted' }];
  const columns = [
    { id: 'claim', accessorKey: 'claim', header: 'Claim' },
    { id: 'status', accessorKey: 'status', header: 'Status' },
  ];

  it('shows a card per row, every column as label and value, with an Open button named by the row', () => {
    const opened = jest.fn();
    render(
      <DataTableView
        label="Jobs"
        columns={columns}
        data={rows}
        emptyText="None"
        cardsBelow={5000}
        rowLabel={(r) => r.claim}
        onRowPress={opened}
      />,
    );
    expect(screen.queryByRole('table')).toBeNull();
    const card = screen.getByRole('listitem');
    expect(card).toHaveTextContent('MRK-26-1001');
    expect(card).toHaveTextContent('StatusSubmitted');
    fireEvent.click(screen.getByLabelText('Open MRK-26-1001'));
    expect(opened).toHaveBeenCalledWith(rows[0]);
  });

  it('stays a table where no card threshold is set, and hides the columns chosen', () => {
    render(
      <DataTableView
        label="Jobs"
        columns={columns}
        data={rows}
        emptyText="None"
        columnChoice={{ storageKey: 'test-jobs', hiddenByDefault: ['status'] }}
      />,
    );
    expect(screen.getByRole('table')).toBeInTheDocument();
    expect(screen.queryByRole('columnheader', { name: /Status/ })).toBeNull();
    fireEvent.click(screen.getByLabelText('Columns (1 hidden)'));
    fireEvent.click(screen.getByLabelText('Status'));
    expect(screen.getByRole('columnheader', { name: /Status/ })).toBeInTheDocument();
    expect(JSON.parse(localStorage.getItem('sightline.columns.test-jobs')!)).toEqual([]);
  });
});
