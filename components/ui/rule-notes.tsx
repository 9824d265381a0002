/** What a driver should know about a tire beyond the rules: a change of season, a different inflation. */
export function RuleNotes({ notes }: { notes: readonly string[] }) {
  return (
    <ul aria-label="Notes" className="mt-2 flex flex-col gap-1 border-l-4 border-accent pl-3 text-sm">
      {notes.map((note) => (
        <li key={note}>
          <span className="font-semibold">Note: </span>
          {note}
        </li>
      ))}
    </ul>
  );
}
