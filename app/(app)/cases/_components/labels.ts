// Display choices the list needs on the client beyond what lib/cases/list-columns formats.
import { BEARING_CLASSES, bearingClassLabel } from "@/lib/cases/bearing-classes";

export const BEARING_CLASS_OPTIONS = BEARING_CLASSES.map((c) => ({ code: c, label: bearingClassLabel(c) }));
