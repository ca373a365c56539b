// The client writes money as the server's reports do: one definition, in shared/format.
export { currencySign, formatMoney } from '../../shared/format/money';
