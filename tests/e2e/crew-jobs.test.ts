import { join } from 'node:path'
import type { Page } from 'playwright-core'
import { describe, expect, it } from 'vitest'
import { runCalculation } from '../../shared/engine/calculate.js'
import { linesetCalculationInput } from '../../shared/hang/lineset-calculation.js'
import type { Lineset } from '../../shared/schemas/lineset.js'
import { DEMO_BRICK_TYPES, DEMO_LINESETS } from '../../server/db/seeders/demo-linesets.js'
import { artifacts, demoInBrowser, signInOnPage } from '../support/demo-in-browser.js'

const suite = demoInBrowser()

async function signIn(email: string): Promise<Page> {
  const page = await suite.newPage()
  await signInOnPage(page, suite.app.url, email)
  await page.locator('[data-testid=linesets-row-1]').waitFor()
  return page
}

describe('the crew at work', () => {
  it('when the technical director renames a lineset, then the new name is saved and read back after a reload', async () => {
    const page = await signIn('td@demo.test')
    await page.locator('[data-testid=linesets-row-3]').click()
    const name = page.locator('[data-testid=lineset-field-name] input')
    await name.fill('Border 1 (rehung)')
    await page.locator('[data-testid=lineset-save]').click()
    await page.locator('[data-testid=lineset-saved]').waitFor()
    await page.reload()
    await expect
      .poll(() => page.locator('[data-testid=lineset-field-name] input').inputValue())
      .toBe('Border 1 (rehung)')
    expect(await page.locator('[data-testid=nav-people]').count()).toBe(0)
    await page.close()
  })

  it('when someone leaves a lineset with unsaved changes, then the app asks first and stays if told to', async () => {
    const page = await signIn('td@demo.test')
    await page.locator('[data-testid=linesets-row-4]').click()
    await page.locator('[data-testid=lineset-field-name] input').fill('Legs 1, half typed')
    const questions: string[] = []
    page.once('dialog', (dialog) => {
      questions.push(dialog.message())
      void dialog.dismiss()
    })
    await page.locator('[data-testid=lineset-back]').click()
    await expect.poll(() => questions).toEqual(['Leave without saving your changes to this lineset?'])
    expect(await page.locator('[data-testid=lineset-field-name] input').inputValue()).toBe('Legs 1, half typed')
    page.once('dialog', (dialog) => void dialog.accept())
    await page.locator('[data-testid=lineset-back]').click()
    await page.locator('[data-testid=linesets-row-4]').waitFor()
    expect(await page.locator('[data-testid=linesets-row-4]').innerText()).toContain('Legs 1')
    await page.close()
  })

  it('when the fly operator changes a hang, then the editor shows the brick plan the shared engine computes, beside the cautions', async () => {
    const page = await signIn('fly@demo.test')
    await page.locator('[data-testid=linesets-row-1]').click()
    // The saved valance opens in the editor; it comes off and a drop goes on in its place.
    await page.locator('[data-testid=hang-row-0-remove]').click()
    await page.locator('[data-testid=hang-items-empty]').waitFor()
    await page.locator('[data-testid=hang-add-hardware]').click()
    await page.locator('[data-testid=hang-row-0-label] input').fill('Show drop')
    await page.locator('[data-testid=hang-row-0-weight] input').fill('200')
    await page.locator('[data-testid=hang-row-0-at] input').fill('24')

    // What the same shared code gives for the demo lineset 1 with that item.
    const demo = DEMO_LINESETS[0]!
    const lineset = {
      id: 'x',
      version: 0,
      updatedAt: '',
      distanceFromPlasterLine: null,
      pipeMomentOfInertia: null,
      pipeSectionModulus: null,
      liftLineWeightPerLength: null,
      liftLineBreakingStrength: null,
      arborEmptyWeight: null,
      arborCapacity: null,
      arborStackLength: null,
      ratedLoad: null,
      pipeWeight: null,
      travel: null,
      sandbagWeight: null,
      hoistRatedCapacity: null,
      hoistSpeed: null,
      ...demo,
    } as Lineset
    const venue = {
      unitSystem: 'imperial' as const,
      balanceTolerance: 10,
      ropeLockHolding: 50,
      wireRopeDesignFactor: 8,
    }
    const brickTypes = DEMO_BRICK_TYPES.map((b) => ({ ...b }))
    const outcome = runCalculation(
      linesetCalculationInput({ lineset, venue, brickTypes, items: [{ label: 'Show drop', weight: 200, at: 24 }] }),
    )
    if (!outcome.ok) throw new Error(JSON.stringify(outcome.error))
    const planned = outcome.result.counterweight!.bricks.filter((b) => b.count > 0)
    expect(planned.length).toBeGreaterThan(0)

    const plan = page.locator('[data-testid=balance-brick-plan]')
    await plan.waitFor()
    for (const brick of planned) await expect.poll(() => plan.innerText()).toContain(`${brick.count} × ${brick.name}`)
    await expect.poll(() => page.locator('[data-testid=balance-cautions]').innerText()).toMatch(/qualified person/)
    expect(await page.locator('[data-testid=lineset-save]').count()).toBe(0)
    await page
      .locator('[data-testid=hang-editor]')
      .screenshot({ path: join(artifacts, 'fly-operator-change-a-hang.png') })
    await page.close()
  })
})
