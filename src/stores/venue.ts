import { defineStore } from 'pinia'
import { computed, ref } from 'vue'
import type { Venue, VenueSettingsUpdate } from '../../shared/schemas/index.js'
import type { UnitSystem } from '../../shared/units/index.js'
import { venueApi } from '../api/venue'

/** The signed-in person's venue: its name, unit system and balance policies. */
export const useVenueStore = defineStore('venue', () => {
  const venue = ref<Venue | null>(null)
  const unitSystem = computed<UnitSystem>(() => venue.value?.unitSystem ?? 'imperial')

  async function load() {
    venue.value = await venueApi.read()
    return venue.value
  }

  async function save(settings: VenueSettingsUpdate) {
    venue.value = await venueApi.update(settings)
    return venue.value
  }

  return { venue, unitSystem, load, save }
})
