// The visit plan's parts on their own: the model suggestion offered and accepted, the leaving
// check that shows the kit not ticked, and the plan read back for a reviewer.
import { fireEvent, render, screen } from '@testing-library/react';

import { ConditionsStep } from '@/components/visit-plan/conditions-step';
import { KitStep } from '@/components/visit-plan/kit-step';
import { PlanSummary } from '@/components/visit-plan/plan-summary';
import { toPlan, toPlanValues } from '@/components/visit-plan/plan-values';
import { DEFAULT_CAMERA_CLASS_SETTINGS } from '@/shared/visit-settings';

import { housePlan } from '../helpers/plans';

const unaccepted = () => ({ ...housePlan(), models: [], modelsAccepted: false });

describe('ConditionsStep', () => {
  it('offers the suggested models and accepts them in one press', () => {
    const change = jest.fn();
    const values = toPlanValues(unaccepted());
    render(<ConditionsStep values={values} plan={toPlan(values).plan} change={change} />);
    expect(screen.getByText('Model 2: Garage')).toBeTruthy();
    fireEvent.click(screen.getByLabelText('Accept the 3 suggested models'));
    const accepted = change.mock.calls[0][0];
    expect(accepted.modelsAccepted).toBe(true);
    expect(accepted.models.map((m: { splitReason: string | null }) => m.splitReason)).toEqual([null, 'daylight', 'daylight']);
  });

  it('suggests one model once outdoor stations are possible', () => {
    const values = toPlanValues({ ...unaccepted(), conditions: { directSun: false, outdoorBlocked: false } });
    render(<ConditionsStep values={values} plan={toPlan(values).plan} change={jest.fn()} />);
    expect(screen.getByLabelText('Accept the suggested model')).toBeTruthy();
  });
});

describe('KitStep', () => {
  it('shows what was not ticked once more before leaving, then records the time', () => {
    const change = jest.fn();
    const settings = DEFAULT_CAMERA_CLASS_SETTINGS.tripod_depth;
    const values = toPlanValues({ ...housePlan(), kitTicked: settings.kitItems.filter((i) => i !== 'Door wedges') });
    render(<KitStep values={values} settings={settings} change={change} />);
    expect(screen.getByText(`1 of ${settings.kitItems.length} not ticked yet.`)).toBeTruthy();
    fireEvent.click(screen.getByLabelText('Leaving the site'));
    expect(screen.getByText(/Not ticked on the kit list: Door wedges\./)).toBeTruthy();
    fireEvent.click(screen.getByLabelText('I have everything: record the time I left'));
    expect(change.mock.calls[0][0].onSite.leftAt).toEqual(expect.any(String));
  });
});

describe('PlanSummary', () => {
  it('reads the plan back with planned against actual time', () => {
    const plan = housePlan({ onSite: { arrivedAt: '2026-11-30T09:00:00.000Z', leftAt: '2026-11-30T09:41:00.000Z' } });
    render(<PlanSummary plan={plan} settings={DEFAULT_CAMERA_CLASS_SETTINGS.tripod_depth} />);
    expect(screen.getByText(/1\. House; 2\. Garage — split: Daylight too strong/)).toBeTruthy();
    // 20 min + 8 × 1.5 min = 32 min planned; 41 min on site.
    expect(screen.getByText('planned 32 min, actual 41 min')).toBeTruthy();
  });
});
