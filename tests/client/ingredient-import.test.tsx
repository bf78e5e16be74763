import { afterEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, screen, waitFor } from '@testing-library/react';
import { toast } from 'sonner';
import { IngredientImport, importWords } from '@/features/ingredients/components/ingredient-import';
import { jsonResponse, renderInApp } from './render';

vi.mock('sonner', () => ({ toast: { error: vi.fn(), success: vi.fn() } }));

afterEach(() => {
  vi.unstubAllGlobals();
  vi.mocked(toast.success).mockClear();
});

describe('what an ingredient import did, in words', () => {
  it('names the parts it did only', () => {
    expect(importWords({ created: 1, ids: [9], updated: 0, updatedIds: [], updatedNames: [], unchanged: 0 })).toBe('Imported: 1 new ingredient');
    expect(importWords({ created: 2, ids: [8, 9], updated: 3, updatedIds: [1, 2, 3], updatedNames: ['A', 'B', 'C'], unchanged: 40 })).toBe('Imported: 2 new ingredients, 3 updated, 40 unchanged');
    expect(importWords({ created: 0, ids: [], updated: 0, updatedIds: [], updatedNames: [], unchanged: 4 })).toBe('Imported: 4 unchanged');
    expect(importWords({ created: 0, ids: [], updated: 0, updatedIds: [], updatedNames: [], unchanged: 0 })).toBe('Imported: nothing to change');
  });
});

describe('the import form', () => {
  it('sends "refuse" unless the box is ticked (a name taken points to the box), then "update", and names what changed', async () => {
    const sent: FormData[] = [];
    const refused = {
      status: 400,
      code: 'import_rejected',
      title: 'Bad request',
      detail: 'The file was not imported: 1 problem (nothing was saved)',
      report: [{ line: 2, column: 'name', reason: 'Your library already has "Cream cheese (example)"', code: 'name_taken' }],
    };
    vi.stubGlobal(
      'fetch',
      vi.fn(async (_url: string, init?: RequestInit) => {
        sent.push(init!.body as FormData);
        if (sent.length === 1) return jsonResponse(refused, 400);
        return jsonResponse({ created: 1, ids: [9], updated: 2, updatedIds: [3, 4], updatedNames: ['Cream cheese (example)', 'Seed crackers (example)'], unchanged: 5 }, 201);
      }),
    );
    renderInApp(<IngredientImport />);
    const file = new File(['name,category\n'], 'mine.csv', { type: 'text/csv' });
    const chooser = screen.getByLabelText('CSV file');
    const box = screen.getByRole('checkbox', { name: 'Update the ones already in my library' });
    // Chosen before pressing Import: the box comes before the button in reading (and Tab) order.
    expect(box.compareDocumentPosition(screen.getByRole('button', { name: 'Import' })) & Node.DOCUMENT_POSITION_FOLLOWING).toBeTruthy();
    // Not ticked: the hint says a known name is a problem.
    const hint = () => document.getElementById(box.getAttribute('aria-describedby')!)?.textContent;
    expect(hint()).toMatch(/^Not ticked: a row named like one of your ingredients is listed as a problem/);

    fireEvent.change(chooser, { target: { files: [file] } });
    fireEvent.click(screen.getByRole('button', { name: 'Import' }));
    await waitFor(() => expect(sent).toHaveLength(1));
    expect(sent[0].get('existing')).toBe('refuse');
    expect(sent[0].get('file')).toBe(file);
    expect(await screen.findByRole('alert')).toHaveProperty('textContent', expect.stringContaining('tick “Update the ones already in my library” and import again'));
    expect(screen.getByRole('cell', { name: 'Your library already has "Cream cheese (example)"' })).toBeTruthy();

    fireEvent.click(box);
    expect(hint()).toMatch(/gives it the file’s values, as an edit by hand would/);
    fireEvent.change(chooser, { target: { files: [file] } });
    fireEvent.click(screen.getByRole('button', { name: 'Import' }));
    await waitFor(() => expect(sent).toHaveLength(2));
    expect(sent[1].get('existing')).toBe('update');
    await waitFor(() => expect(toast.success).toHaveBeenLastCalledWith('Imported: 1 new ingredient, 2 updated, 5 unchanged'));
    const note = screen.getByText('Updated from the file: 2 ingredients').closest('[role="note"]');
    expect(note?.textContent).toBe('ℹUpdated from the file: 2 ingredientsCream cheese (example) and Seed crackers (example).');
    expect(screen.queryByRole('alert')).toBeNull();
  });
});
