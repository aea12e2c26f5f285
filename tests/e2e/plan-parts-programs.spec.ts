/**
 * Programmer: a part with a plane datum, a 12H7 bore with a position tolerance,
 * a generated program with its touch points in 3D, an edit whose verifier finding
 * shows as a marker, saved as revision 2. Then a CSV with two bad rows is refused
 * naming both.
 */
import { expect, test, type Page } from '@playwright/test';
import { storageStateFor } from './support/roles';

test.use({ storageState: storageStateFor('programmer') });
test.setTimeout(300_000);
const slow = { timeout: 60_000 };

async function addFeature(page: Page, values: Record<string, string>) {
  const form = page.getByRole('form', { name: 'Add a feature' });
  if (!(await form.isVisible())) await page.getByRole('toolbar', { name: 'Part actions' }).getByRole('button', { name: 'Add feature' }).click();
  await form.getByLabel('Type').selectOption(values.type ?? 'bore');
  for (const [id, v] of Object.entries(values)) if (id !== 'type') await form.locator(`#feature-${id}`).fill(v);
  await form.getByRole('button', { name: 'Add feature' }).click();
  await expect(page.getByRole('region', { name: 'Features' }).getByRole('cell', { name: values.label, exact: true })).toBeVisible(slow);
}

test('programmer builds a part, generates, edits and saves revision 2', async ({ page }) => {
  const number = `E2E-${Date.now()}`;
  await page.goto('/parts');
  await page.getByRole('button', { name: 'New part' }).click();
  await page.getByLabel('Part number').fill(number);
  await page.getByLabel('Drawing revision').fill('A');
  await page.getByLabel('Name', { exact: true }).fill('Demo cover plate');
  await page.getByLabel('Material').fill('aluminium 6061');
  await page.getByRole('button', { name: 'Create part' }).click();
  await expect(page.getByRole('heading', { name: `${number} rev. A` })).toBeVisible(slow);

  await addFeature(page, { type: 'plane', label: '1', x: '0', y: '0', z: '0', size_u: '80', size_v: '60' });
  await addFeature(page, { type: 'bore', label: '2', x: '15', y: '10', z: '0', diameter: '12', depth: '10' });
  page.once('dialog', (d) => void d.accept('A'));
  await page.getByRole('region', { name: 'Features' }).getByRole('row', { name: /^1 plane/ }).getByRole('button', { name: 'Set datum' }).click();
  await expect(page.getByRole('region', { name: 'Features' }).getByRole('row', { name: /^1 plane/ })).toContainText('A', slow);

  await page.getByRole('toolbar', { name: 'Part actions' }).getByRole('button', { name: 'Add tolerance' }).click();
  const tol = page.getByRole('form', { name: 'Add a tolerance' });
  await tol.getByLabel('Feature').selectOption({ label: '2 (bore)' });
  await tol.getByLabel('Characteristic').selectOption('diameter');
  await tol.getByLabel('Fit code').fill('12H7');
  await tol.getByRole('button', { name: 'Add tolerance' }).click();
  const tolerances = page.getByRole('region', { name: 'Tolerances' });
  await expect(tolerances).toContainText('12.000 to 12.018 mm', slow);
  await tol.getByLabel('Characteristic').selectOption('position');
  await tol.getByLabel('Zone (mm)').fill('0.05');
  await tol.getByLabel('Material condition').selectOption('MMC');
  await tol.getByLabel('Datums').fill('A');
  await tol.getByRole('button', { name: 'Add tolerance' }).click();
  await expect(tolerances.getByRole('row', { name: /position/ })).toContainText('MMC · A', slow);
  await page.screenshot({ path: 'test-results/screens/plan-part.png', fullPage: true });

  // A program for the 3-axis demo machine; revision 1 is generated on the server.
  await page.goto('/programs');
  await page.getByRole('button', { name: 'New program' }).click();
  await page.getByLabel('Program name').fill(`${number} probing`);
  await page.getByLabel('Part').selectOption({ label: `${number} rev A — Demo cover plate` });
  await page.getByLabel('Machine').selectOption({ label: 'VMC-2 three-axis vertical' });
  await page.getByLabel('Post-processor').selectOption('ngc');
  await page.getByRole('button', { name: 'Create and generate' }).click();
  await expect(page.getByRole('link', { name: 'Revision 1' })).toBeVisible({ timeout: 120_000 });
  await page.getByRole('link', { name: 'Revision 1' }).click();
  await expect(page.getByTestId('part-view')).toHaveAttribute('data-touch-points', /^[1-9]\d*$/, slow);
  await expect(page.getByTestId('code-editor')).toHaveAttribute('data-readonly', 'true', slow);
  await expect(page.locator('.monaco-editor')).toBeVisible(slow);
  await page.screenshot({ path: 'test-results/screens/plan-revision-1.png', fullPage: true });

  // Edit: an unknown word makes a verifier finding, shown as a marker; save as revision 2.
  await page.getByRole('button', { name: 'Edit' }).click();
  await page.locator('.monaco-editor .view-lines').click();
  await page.keyboard.press('Control+End');
  await page.keyboard.press('Enter');
  await page.keyboard.insertText('Q77 (inserted by hand)');
  await page.getByLabel('What you changed').fill('added a stray word to check the verifier');
  await page.getByRole('button', { name: 'Save as new revision' }).click();
  await expect(page.getByRole('heading', { name: /revision 2/ })).toBeVisible(slow);
  await expect(page.getByRole('region', { name: 'Verifier findings' }).getByRole('listitem').first()).toBeVisible(slow);
  // The finding is on the added last line: jump there from the list, then the marker is drawn.
  await page.getByRole('region', { name: 'Verifier findings' }).getByRole('button', { name: /^line \d+/ }).first().click();
  await expect(page.getByTestId('code-editor')).toHaveAttribute('data-readonly', 'true');
  // Monaco draws decorations only for lines in view: with the line revealed, the marker is drawn.
  await expect(page.locator('.monaco-editor .squiggly-error, .monaco-editor .squiggly-warning, .monaco-editor .squiggly-info').first()).toBeVisible(slow);
  await page.screenshot({ path: 'test-results/screens/plan-revision-2.png', fullPage: true });
});

test('a CSV with two bad rows is refused, both rows named', async ({ page, request }) => {
  const number = `CSV-${Date.now()}`;
  const created = await request.post('/api/parts', { data: { number, revision: 'A', name: 'CSV check' } });
  expect(created.status()).toBe(201);
  const { id } = (await created.json()) as { id: string };
  const csv = [
    'record,label,type,x,y,z,axis_x,axis_y,axis_z,ref_x,ref_y,ref_z,diameter,depth,size_u,size_v,datum,characteristic,value,fit,datums',
    'feature,1,plane,0,0,0,0,0,1,1,0,0,,,80,60,A,,,,',
    'feature,2,bore,20,15,0,0,0,1,,,,-12,10,,,,,,,', // line 3: negative diameter
    'feature,3,bore,40,15,0,0,0,1,,,,8,10,,,,,,,',
    'tolerance,3,,,,,,,,,,,,,,,,position,0.05,,D', // line 5: datum D not assigned
  ].join('\n');
  await page.goto(`/parts/${id}`);
  await page.getByRole('button', { name: 'Import CSV' }).click();
  await page.getByLabel('CSV file').setInputFiles({ name: 'bad.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });
  const preview = page.getByRole('table', { name: 'Import preview' });
  await expect(preview).toBeVisible(slow);
  await expect(page.getByRole('status').filter({ hasText: 'row(s) have problems' })).toContainText('2 row(s)');
  await expect(preview.locator('tr[data-ok="false"]')).toHaveCount(2);
  await expect(preview.getByRole('row', { name: /^3 / })).toContainText('diameter');
  await expect(preview.getByRole('row', { name: /^5 / })).toContainText('datum D');
  await expect(page.getByRole('button', { name: 'Import all rows' })).toBeDisabled();
  await page.screenshot({ path: 'test-results/screens/plan-csv-refused.png', fullPage: true });
  // The API refuses the whole file too and stores nothing.
  const all = await request.post(`/api/parts/${id}/import`, { data: { csv, mode: 'all' } });
  expect(all.status()).toBe(400);
  expect(((await all.json()) as { error: { message: string } }).error.message).toMatch(/lines 3, 5/);
  const part = (await (await request.get(`/api/parts/${id}`)).json()) as { part: { features: unknown[] } };
  expect(part.part.features).toHaveLength(0);
});
