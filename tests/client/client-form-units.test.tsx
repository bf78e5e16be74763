import { describe, expect, it, vi } from 'vitest';
import { fireEvent, screen, waitFor } from '@testing-library/react';
import { ClientForm, emptyClient } from '@/features/clients/components/client-form';
import { renderInApp } from './render';

describe('height and weight in US measures', () => {
  it("a US coach types feet, inches and pounds; the profile gets centimetres and kilograms", async () => {
    const onSubmit = vi.fn();
    renderInApp(<ClientForm initial={{ ...emptyClient, name: 'Ana Example' }} submitLabel="Save client" unitSystem="us" onSubmit={onSubmit} />);
    fireEvent.change(screen.getByLabelText('Height (ft)'), { target: { value: '5' } });
    fireEvent.change(screen.getByLabelText('Height (in)'), { target: { value: '6' } });
    fireEvent.change(screen.getByLabelText('Weight (lb)'), { target: { value: '163' } });
    expect(screen.getByText('= 167.64 cm')).toBeTruthy();
    expect(screen.getByText('= 73.94 kg')).toBeTruthy();
    expect(screen.getByText(/= 0\.68 g per lb of body weight/)).toBeTruthy(); // the form's 1.5 g per kg
    fireEvent.click(screen.getByRole('button', { name: 'Save client' }));
    await waitFor(() => expect(onSubmit).toHaveBeenCalled());
    expect(onSubmit.mock.calls[0]![0]).toMatchObject({ heightCm: '167.64', weightKg: '73.94' });
    expect(screen.queryByLabelText('Height (cm)')).toBeNull();
  });

  it('a metric coach types centimetres and kilograms', () => {
    renderInApp(<ClientForm initial={emptyClient} submitLabel="Save client" unitSystem="metric" onSubmit={vi.fn()} />);
    expect((screen.getByLabelText('Height (cm)') as HTMLInputElement).value).toBe('165');
    expect((screen.getByLabelText('Weight (kg)') as HTMLInputElement).value).toBe('70');
    expect(screen.queryByLabelText('Weight (lb)')).toBeNull();
  });
});
