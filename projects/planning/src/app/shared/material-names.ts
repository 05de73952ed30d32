// The shop's own labels come from /materials; these are the calculator's keys as a builder says them.
export { baseMaterialName as materialName, SHEET_MATERIALS } from '@tubwright/kit';
