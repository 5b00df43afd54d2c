// Once a ticket is loaded, the out of balance the recorded counts give (kg at the batten, signed + batten heavy),
// beside the plan's expected one: a load that differs from the plan shows its own figure, not the plan's.
const up = `
ALTER TABLE weight_change_tickets ADD COLUMN loaded_out_of_balance numeric;
`

const down = `
ALTER TABLE weight_change_tickets DROP COLUMN loaded_out_of_balance;
`

export default { name: '0012-ticket-loaded-balance', up, down }
