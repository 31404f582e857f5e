"use client";
// The removal form loaded on demand: the case page draws it only on a draft someone may edit, and a
// client-side dynamic import is what keeps its code (and its validation) out of every other case page.
import dynamic from "next/dynamic";

export const RemovalFormLazy = dynamic(() => import("./removal-form").then((m) => m.RemovalForm));
