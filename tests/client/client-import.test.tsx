import { afterEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, screen, waitFor } from '@testing-library/react';
import Papa from 'papaparse';
import { toast } from 'sonner';
import { ClientImport } from '@/features/clients/components/client-import';
import { jsonResponse, renderInApp } from './render';

vi.mock('sonner', () => ({ toast: { error: vi.fn(), success: vi.fn() } }));

afterEach(() => {
  vi.unstubAllGlobals();
  vi.mocked(toast.success).mockClear();
});

const templateOf = () => {
  const href = screen.getByRole('link', { name: 'Download a template' }).getAttribute('href')!;
  return Papa.parse<string[]>(decodeURIComponent(href.replace(/^data:text\/csv;charset=utf-8,/, '')), { skipEmptyLines: true }).data;
};

describe('clients from a spreadsheet', () => {
  it('offers a template in the coach’s units (US: feet, inches, pounds and protein per lb)', () => {
    vi.stubGlobal('fetch', vi.fn());
    renderInApp(<ClientImport units="us" />);
    const [header, first] = templateOf();
    expect(header).toContain('protein_g_per_lb');
    expect(header).not.toContain('protein_g_per_kg');
    const row = Object.fromEntries(header.map((h, i) => [h, first[i]]));
    expect(row).toMatchObject({ height: '5 ft 6 in', weight: '163 lb', protein_g_per_lb: '0.7' });
    expect(screen.getByText(/a number alone is\s+read in your units \(inches and pounds\)/)).toBeTruthy();
  });

  it('offers a metric template to a metric coach', () => {
    vi.stubGlobal('fetch', vi.fn());
    renderInApp(<ClientImport units="metric" />);
    const [header, first] = templateOf();
    expect(header).toContain('protein_g_per_kg');
    expect(Object.fromEntries(header.map((h, i) => [h, first[i]]))).toMatchObject({ height: '168 cm', weight: '74 kg' });
  });

  it('sends the file with the coach’s units, lists a refused file’s problems, then names the clients added', async () => {
    const sent: FormData[] = [];
    const refused = {
      status: 400,
      code: 'import_rejected',
      title: 'Bad request',
      detail: 'The file was not imported: 1 problem (nothing was saved)',
      report: [{ line: 3, column: 'height', reason: '"5.7" would be 5.7 inches: write 5 ft 7 in, 5\'7" or 67 in' }],
    };
    vi.stubGlobal(
      'fetch',
      vi.fn(async (_url: string, init?: RequestInit) => {
        sent.push(init!.body as FormData);
        if (sent.length === 1) return jsonResponse(refused, 400);
        return jsonResponse({ created: 2, ids: [41, 42], names: ['Ana Demo', 'Ben Demo'], withEmail: 1 }, 201);
      }),
    );
    renderInApp(<ClientImport units="metric" />);
    const file = new File(['name,sex\n'], 'clients.csv', { type: 'text/csv' });
    fireEvent.click(screen.getByRole('button', { name: 'Import clients' }));
    expect((await screen.findByRole('alert')).textContent).toContain('Choose a CSV file first');
    expect(sent).toHaveLength(0);

    fireEvent.change(screen.getByLabelText('CSV file'), { target: { files: [file] } });
    fireEvent.click(screen.getByRole('button', { name: 'Import clients' }));
    await waitFor(() => expect(sent).toHaveLength(1));
    expect(sent[0].get('units')).toBe('metric');
    expect(sent[0].get('file')).toBe(file);
    expect((await screen.findByRole('alert')).textContent).toContain('The file was not imported: 1 problem');
    expect(screen.getByRole('cell', { name: /would be 5.7 inches/ })).toBeTruthy();

    fireEvent.change(screen.getByLabelText('CSV file'), { target: { files: [file] } });
    fireEvent.click(screen.getByRole('button', { name: 'Import clients' }));
    await waitFor(() => expect(toast.success).toHaveBeenLastCalledWith('Imported: 2 new clients'));
    const note = screen.getByText('Added from the file: 2 clients').closest('[role="note"]');
    expect(note?.textContent).toContain('Ana Demo, Ben Demo.');
    expect(note?.textContent).toContain('1 of them has an e-mail address. The import sent no invitation');
    expect(screen.getByRole('link', { name: 'Ana Demo' }).getAttribute('href')).toBe('/clients/41');
    expect(screen.queryByRole('alert')).toBeNull();
    expect(screen.queryByRole('table')).toBeNull();
  });
});
