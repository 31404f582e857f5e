// Words the similarity reasons add to the shared code labels (lib/classification/labels.ts).
import { componentPhrase } from "@/lib/classification/labels";

/** " on the cup", or nothing for the grease (where "Grease with water on the grease" would read badly). */
export const onPart = (component: string) => (component === "lubricant" ? "" : ` on ${componentPhrase(component)}`);
