import type { Venue, VenueSettingsUpdate } from '../../shared/schemas/index.js'
import { api } from './client'

export const venueApi = {
  read: () => api.get<Venue>('/venue').then((r) => r.data),
  update: (body: VenueSettingsUpdate) => api.put<Venue>('/venue', body).then((r) => r.data),
}
