import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, type Browser } from './support/browser.js';
import { collectConsoleErrors } from './support/console-errors.js';
import { mailedLinkPath } from './support/mailed-link.js';
import { screenshotOnFailure } from './support/screenshot-on-failure.js';
import { startProduct, type RunningProduct } from './support/start-product.js';

const DEMO_PASSWORD = 'loftwright-demo';
/**
 * The hidden answer of the demo exercise, 1.0557 kg/m³ (U.S. Standard Atmosphere 1976 sea-level
 * density 1.2250 kg/m³ less helium's ideal-gas 0.16928 kg/m³), as it could appear: kg/m³ or g/L,
 * g/m³, lb/ft³ (0.065 906), with a decimal point or comma.
 */
const HIDDEN_ANSWER = /1[.,]05(5[6-9]|6\b)|1\s?05[56][.,]\d|0[.,]0659/;

describe('the classroom in the browser: publish, join, walk through, exercise, submissions', () => {
  let product: RunningProduct;
  let teacherBrowser: Browser;
  let studentBrowser: Browser;
  let teacher: Page;
  let student: Page;
  let teacherErrors: string[];
  let studentErrors: string[];
  let joinCode = '';
  let exampleUrl = '';

  const signIn = async (page: Page, email: string) => {
    await page.goto(`${product.baseUrl}/sign-in`);
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill(DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(`${product.baseUrl}/calculations`);
  };

  beforeAll(async () => {
    product = await startProduct();
    // Two browsers, as a teacher's laptop and a student's are: separate sessions.
    teacherBrowser = await launchBrowser();
    studentBrowser = await launchBrowser();
    teacher = await teacherBrowser.context.newPage();
    student = await studentBrowser.context.newPage();
    teacherErrors = collectConsoleErrors(teacher);
    studentErrors = collectConsoleErrors(student);
    await signIn(teacher, 'teacher@demo.test');
    await signIn(student, 'student@demo.test');
  });

  afterAll(async () => {
    await teacherBrowser?.close();
    await studentBrowser?.close();
    await product?.stop();
  });

  it('lets the teacher create a class and publish a worked example set as an exercise', async () => {
    screenshotOnFailure(() => teacher, 'classroom-teacher-publish');
    await teacher.getByRole('menuitem', { name: 'Classes' }).click();
    await teacher.getByLabel('New class').fill('Evening lift club');
    await teacher.getByRole('button', { name: 'Create class' }).click();
    await teacher.waitForURL(/\/classes\/[0-9a-f-]{36}$/);
    const code = teacher.locator('[data-join-code]');
    await expect.poll(() => code.isVisible()).toBe(true);
    joinCode = ((await code.textContent()) ?? '').trim();
    expect(joinCode).toMatch(/^[A-Z2-9]{4}-[A-Z2-9]{4}$/);

    await teacher.getByLabel('Calculation').click();
    await teacher
      .locator(
        '.ant-select-item-option[title="Lesson: helium lift per litre in standard sea-level air"]:visible',
      )
      .click();
    await teacher.getByLabel('Version').click();
    await teacher.locator('.ant-select-item-option[title^="v1, draft"]:visible').click();
    await teacher.getByLabel('Title for the class').fill('Lift of a litre, evening class');
    await teacher
      .getByLabel('Introduction')
      .fill('Check against the U.S. Standard Atmosphere 1976 sea-level density, 1.2250 kg/m³.');
    await teacher.getByRole('button', { name: 'Publish to the class' }).click();
    await teacher.waitForURL(/\/examples\/[0-9a-f-]{36}$/);
    exampleUrl = teacher.url();

    await teacher.getByRole('tab', { name: 'Set up' }).click();
    await teacher.getByRole('checkbox', { name: /altitude/i }).check();
    await teacher.getByLabel(/altitude.*highest value/i).fill('5000');
    await teacher.getByLabel('Students work out some results themselves').click();
    await teacher.getByRole('checkbox', { name: 'Gross lift per cubic metre' }).check();
    await teacher.getByRole('button', { name: 'Save settings' }).click();
    await expect.poll(() => teacher.getByText('Example settings saved').isVisible()).toBe(true);
    await expect.poll(() => teacher.getByText('exercise, ±2 %').first().isVisible()).toBe(true);
  });

  it('lets a student join with the code and step through the example with the keyboard', async () => {
    screenshotOnFailure(() => student, 'classroom-student-walk');
    await student.goto(`${product.baseUrl}/join/${joinCode.replace('-', '')}`);
    await expect.poll(() => student.getByLabel('Join code').inputValue()).toMatch(/^[A-Z2-9]{8}$/);
    await student.getByRole('button', { name: 'Join class' }).click();
    await student.waitForURL(/\/classes\/[0-9a-f-]{36}$/);
    await student.getByRole('link', { name: 'Lift of a litre, evening class' }).click();
    await student.waitForURL(exampleUrl);

    const walk = student.getByRole('region', { name: /Walk-through/ });
    const current = walk.locator('[aria-current="step"]');
    await expect.poll(() => walk.getByText(/^Step 1 of \d+/).isVisible()).toBe(true);
    await walk.focus();
    // Formula first; the numbers and the result follow, one key press each.
    expect(await current.locator('[data-part="values"]').count()).toBe(0);
    await student.keyboard.press('ArrowRight');
    expect(await current.locator('[data-part="values"]').count()).toBe(1);
    expect(await current.locator('[data-part="result"]').count()).toBe(0);
    await student.keyboard.press('ArrowRight');
    await student.keyboard.press('ArrowRight');
    await expect.poll(() => walk.getByText(/^Step 2 of \d+/).isVisible()).toBe(true);
    expect(await walk.locator('li[data-step]').count()).toBe(2);
    await student.keyboard.press('ArrowLeft');
    await expect.poll(() => walk.getByText(/^Step 1 of \d+/).isVisible()).toBe(true);

    await student.keyboard.press('a');
    const stepCount = await walk.locator('li[data-step]').count();
    expect(stepCount).toBeGreaterThan(5);
    await expect
      .poll(() => walk.getByText(`Step ${stepCount} of ${stepCount}`, { exact: false }).isVisible())
      .toBe(true);
    // The result to work out is held back until the student answers.
    const lastResult = walk.locator('li[data-step="lift-per-cubic-metre"] [data-part="result"]');
    expect(await lastResult.textContent()).toContain('= ?');
    // Nor does it show anywhere else on the page, in any unit it could be written in.
    expect(await student.locator('body').innerText()).not.toMatch(HIDDEN_ANSWER);
  });

  it('lets a newcomer without an account register as a student from the join link', async () => {
    const newcomer = await launchBrowser();
    try {
      const page = await newcomer.context.newPage();
      screenshotOnFailure(() => page, 'classroom-newcomer');
      await page.goto(`${product.baseUrl}/join/${joinCode.replace('-', '')}`);
      await page.getByRole('link', { name: 'Create a student account and join' }).click();
      await page.getByLabel('Name').fill('Mina Osei');
      await page.getByLabel('E-mail').fill('mina@school.test');
      await page.getByLabel('Password').fill('a-long-password-1');
      await page.getByRole('button', { name: 'Create account' }).click();
      // The account is made when the link mailed to the address is opened.
      await expect.poll(() => page.getByText('Check your mail').isVisible()).toBe(true);
      const link = await mailedLinkPath(product, 'mina@school.test', '/confirm-account');
      await page.goto(`${product.baseUrl}${link}`);
      await page.waitForURL(`${product.baseUrl}/classes`);
      const row = page.getByRole('table', { name: 'Classes' }).getByRole('row', {
        name: /Evening lift club/,
      });
      await expect.poll(() => row.isVisible()).toBe(true);
      expect(await row.textContent()).toContain('student');
    } finally {
      await newcomer.close();
    }
  });

  it('checks the student’s answer, says which step went wrong, then accepts a right one', async () => {
    screenshotOnFailure(() => student, 'classroom-student-exercise');
    await student.getByRole('tab', { name: 'Exercise' }).click();
    const answer = student.getByLabel('Gross lift per cubic metre');
    await answer.fill('1.2');
    await student.getByRole('button', { name: 'Submit answers' }).click();
    await expect.poll(() => student.getByText('Attempt 1: 0 of 1 right').isVisible()).toBe(true);
    expect(
      await student.getByText(/It went wrong at step \d+: Gross lift per cubic metre/).count(),
    ).toBe(1);

    // A wrong attempt does not give the answer away: the teacher's rule reveals it after a right one.
    expect(await student.locator('body').innerText()).not.toMatch(HIDDEN_ANSWER);
    await student.getByRole('tab', { name: 'Walk through' }).click();
    await student.getByRole('region', { name: /Walk-through/ }).focus();
    await student.keyboard.press('End');
    const marked = student.locator('li[data-step="lift-per-cubic-metre"]');
    await expect.poll(() => marked.getByText('Your answer went wrong here').isVisible()).toBe(true);
    expect(await marked.locator('[data-part="result"]').textContent()).toContain('= ?');
    expect(await student.locator('body').innerText()).not.toMatch(HIDDEN_ANSWER);

    await student.getByRole('tab', { name: 'Exercise' }).click();
    await student.getByLabel('Gross lift per cubic metre').fill('1.056 kg/m^3');
    await student.getByRole('button', { name: 'Submit again' }).click();
    await expect.poll(() => student.getByText('Attempt 2: 1 of 1 right').isVisible()).toBe(true);
    expect(await student.getByText(/All right, within 2 %/).count()).toBe(1);
    // Revealed after the right answer: 1.2250 − 0.16928 kg/m³ = 1.0557 kg/m³.
    await student.getByRole('tab', { name: 'Walk through' }).click();
    await student.getByRole('region', { name: /Walk-through/ }).focus();
    await student.keyboard.press('End');
    await expect
      .poll(() => marked.locator('[data-part="result"]').textContent())
      .toMatch(/1\.0557\d* kg\/m³/);
    // The pattern the checks above rely on does find the answer once it is shown.
    expect(await student.locator('body').innerText()).toMatch(HIDDEN_ANSWER);
  });

  it('lets the student try other inputs within the teacher’s range, without changing the example', async () => {
    screenshotOnFailure(() => student, 'classroom-student-try');
    await student.getByRole('tab', { name: 'Try it yourself' }).click();
    const altitude = student.locator('[data-try="ambient.altitudeM"]').getByRole('textbox');
    const yours = student.locator('[data-yours="liftPerCubicMetre"]');
    const before = await yours.textContent();
    await altitude.fill('2000 m');
    await expect.poll(() => yours.textContent()).not.toBe(before);
    // Air at 2 km in the 1976 standard is 0.8217 of sea level (PDAS table, σ at 2 km), so the
    // lift per cubic metre falls by about a fifth.
    const lifted = Number.parseFloat((await yours.textContent()) ?? '');
    expect(lifted).toBeGreaterThan(0.8);
    expect(lifted).toBeLessThan(0.9);
    await altitude.fill('9000 m');
    await expect
      .poll(() => student.getByText(/Outside what your teacher allowed/).isVisible())
      .toBe(true);
    // The published example is untouched.
    await student.reload();
    await student.getByRole('tab', { name: 'Try it yourself' }).click();
    await expect.poll(() => yours.textContent()).toBe(before);
  });

  it('shows the teacher every submission with right and wrong, and exports them as CSV', async () => {
    screenshotOnFailure(() => teacher, 'classroom-teacher-submissions');
    await teacher.goto(exampleUrl);
    await teacher.getByRole('tab', { name: 'Submissions' }).click();
    const table = teacher.getByRole('table', { name: 'Submissions' });
    await expect.poll(() => table.getByRole('row', { name: /Felix Brandt/ }).count()).toBe(2);
    expect(
      await table
        .getByRole('row', { name: /Felix Brandt/ })
        .first()
        .textContent(),
    ).toContain('wrong');
    const [download] = await Promise.all([
      teacher.waitForEvent('download'),
      teacher.getByRole('button', { name: 'Export the exercise submissions as CSV' }).click(),
    ]);
    const csv = readFileSync((await download.path()) ?? '', 'utf8');
    const lines = csv.trim().split(/\r?\n/);
    expect(lines).toHaveLength(3);
    expect(lines[1]).toContain('Felix Brandt');
    expect(lines[2]).toContain('right');
    expect(teacherErrors).toEqual([]);
    expect(studentErrors).toEqual([]);
  });
});
