// The client writes amounts as the server's reports do: one definition, in shared/format.
export { amountWords } from '../../shared/format/amount-words';
