import { describe, expect, it } from 'vitest';
import { BookFormSchema, toOptionsRequest } from './book-form-schema';

const plan = { sittings: [{ steps: [{ kind: 'hands_on' as const, label: 'Apply', product: 'none', minutes: 30 }] }] };
const valid = {
  clientId: '0b6e2a55-6f1d-4f4e-9a43-2d3f4b5c6d7e',
  serviceId: '1b6e2a55-6f1d-4f4e-9a43-2d3f4b5c6d7e',
  stylistId: '',
  earliestDate: '2027-03-02',
  stepPlan: plan,
};

describe('BookFormSchema', () => {
  it('asks for a client when none is picked', () => {
    const result = BookFormSchema.safeParse({ ...valid, clientId: '' });
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]!.message).toBe('Pick a client or add a new one');
  });
  it('refuses a developing step whose least time exceeds its most', () => {
    const bad = { sittings: [{ steps: [{ kind: 'developing' as const, label: 'Lift', product: 'lightener', minMinutes: 50, maxMinutes: 30 }] }] };
    expect(BookFormSchema.safeParse({ ...valid, stepPlan: bad }).success).toBe(false);
  });
  it('turns "any stylist" into null for the request', () => {
    expect(toOptionsRequest(BookFormSchema.parse(valid)).stylistId).toBeNull();
  });
});
