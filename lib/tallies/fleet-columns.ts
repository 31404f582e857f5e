// The fleet list's columns and the template offered for download. Apart from the reader
// (fleet-csv.ts, with zod) so the upload card in the browser can name them without the validation library.
export const FLEET_COLUMNS = ["serial", "bearing_class", "mounted_on", "as_of", "service_months", "service_miles"] as const;

export const FLEET_TEMPLATE = `${FLEET_COLUMNS.join(",")}\r\nSRX40001,F,2019-04-10,2026-03-31,,\r\nSRX40002,G,,2026-03-31,58.5,402000\r\n`;
