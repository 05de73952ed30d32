const MONEY = new Intl.NumberFormat('en-US', { minimumFractionDigits: 2, maximumFractionDigits: 2 });

/** An amount in the price list's currency (the API names none): `2,598.63`. */
export const formatMoney = (amount: number): string => MONEY.format(amount);
