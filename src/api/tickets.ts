import type {
  TicketApprove,
  TicketComplete,
  TicketDecline,
  TicketState,
  TicketView,
} from '../../shared/schemas/index.js'
import { api } from './client'

const ticketPath = (id: string, step = '') => `/tickets/${encodeURIComponent(id)}${step ? `/${step}` : ''}`
const post = (id: string, step: string, body: object) =>
  api.post<TicketView>(ticketPath(id, step), body).then((r) => r.data)

export const ticketsApi = {
  /** The venue's change tickets, newest first, in one state or all. */
  list: (state?: TicketState) =>
    api.get<TicketView[]>('/tickets', { params: state ? { state } : {} }).then((r) => r.data),
  get: (id: string) => api.get<TicketView>(ticketPath(id)).then((r) => r.data),
  /** Asks for the change a saved hang revision needs; the server works out the plan. */
  open: (hangId: string) => api.post<TicketView>('/tickets', { hangId }).then((r) => r.data),
  approve: (id: string, body: TicketApprove) => post(id, 'approve', body),
  decline: (id: string, body: TicketDecline) => post(id, 'decline', body),
  withdraw: (id: string, version: number) => post(id, 'withdraw', { version }),
  startLoading: (id: string, version: number) => post(id, 'start-loading', { version }),
  complete: (id: string, body: TicketComplete) => post(id, 'complete', body),
}
