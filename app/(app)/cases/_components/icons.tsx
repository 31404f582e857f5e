// Small stroke icons for the case list, drawn in the current text colour.
const paths = {
  search: "M11 18a7 7 0 100-14 7 7 0 000 14zM20 20l-4-4",
  chevron: "M6 9l6 6 6-6",
  download: "M12 4v11M7 10l5 5 5-5M5 20h14",
  columns: "M4 5h16v14H4zM10 5v14M15 5v14",
  filter: "M4 6h16M7 12h10M10 18h4",
  up: "M12 19V5M6 11l6-6 6 6",
  down: "M12 5v14M6 13l6 6 6-6",
  updown: "M8 9l4-4 4 4M8 15l4 4 4-4",
  x: "M6 6l12 12M18 6L6 18",
  check: "M5 12l5 5 9-10",
  calendar: "M4 6h16v14H4zM4 10h16M8 3v4M16 3v4",
  left: "M15 6l-6 6 6 6",
  right: "M9 6l6 6-6 6",
  plus: "M12 5v14M5 12h14",
  inbox: "M4 13l3-8h10l3 8v6H4zM4 13h5l1 2h4l1-2h5",
} as const;

export type IconName = keyof typeof paths;

export function Icon({ name, className = "h-4 w-4" }: { name: IconName; className?: string }) {
  return (
    <svg
      viewBox="0 0 24 24"
      className={className}
      fill="none"
      stroke="currentColor"
      strokeWidth="1.8"
      strokeLinecap="round"
      strokeLinejoin="round"
      aria-hidden
    >
      <path d={paths[name]} />
    </svg>
  );
}
