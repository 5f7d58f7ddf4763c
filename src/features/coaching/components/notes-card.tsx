import { formatDate } from "#shared/format";
import { useState } from "react";
import { toast } from "../../../lib/toast";
import { NOTE_MAX } from "#shared/schemas/notes";
import { Alert, Button, Card, CardTitle } from "../../../components/ui";
import { errorMessage } from "../../../lib/query-client";
import { useAddNote, useNotes } from "../api/notes";

/** Dated notes on a player, newest first. `canWrite`: the coach's form (the player only reads). */
export function NotesCard({ playerId, playerName, canWrite }: { playerId: string; playerName: string; canWrite: boolean }) {
  const notes = useNotes(playerId);
  const add = useAddNote(playerId);
  const [text, setText] = useState("");
  const [error, setError] = useState<string | null>(null);
  const submit = async () => {
    setError(null);
    try {
      await add.mutateAsync(text);
      setText("");
      toast.success(`Note saved. ${playerName} can read it on their ladders page.`);
    } catch (e) {
      setError(errorMessage(e));
    }
  };
  return (
    <Card>
      <CardTitle>{canWrite ? "Notes" : "Notes from your coach"}</CardTitle>
      {canWrite ? (
        <form
          className="mt-3 flex flex-col gap-2"
          onSubmit={(e) => {
            e.preventDefault();
            void submit();
          }}
        >
          <label htmlFor="note-text" className="text-sm font-medium text-ink-800">
            A note for {playerName} (they will see it, with today’s date)
          </label>
          <textarea
            id="note-text"
            value={text}
            maxLength={NOTE_MAX}
            rows={3}
            onChange={(e) => setText(e.target.value)}
            aria-invalid={error ? true : undefined}
            aria-describedby={error ? "note-error" : undefined}
            className="block w-full rounded-xl border-2 border-ink-900/15 bg-white px-4 py-3 text-base text-ink-900 hover:border-ink-900/30 focus:border-ink-700 focus:outline-none focus-visible:outline-3 focus-visible:outline-coral-500"
          />
          {error ? (
            <p id="note-error" className="text-sm font-medium text-bad-600">
              {error}
            </p>
          ) : null}
          <div>
            <Button type="submit" size="sm" disabled={text.trim() === ""} pending={add.isPending}>
              {add.isPending ? "Saving…" : "Save note"}
            </Button>
          </div>
        </form>
      ) : null}
      <div className="mt-4">
        {notes.isPending ? (
          <p className="text-ink-500">Loading notes…</p>
        ) : notes.isError ? (
          <Alert tone="error">{errorMessage(notes.error)}</Alert>
        ) : notes.data.notes.length === 0 ? (
          <p className="text-ink-500">
            {canWrite ? `No notes yet. What you write here, ${playerName} reads.` : "No notes from your coach yet."}
          </p>
        ) : (
          <ol className="flex flex-col divide-y divide-ink-900/10">
            {notes.data.notes.map((n) => (
              <li key={n.id} className="py-3">
                <p className="text-sm text-ink-500">
                  <time dateTime={n.createdAt}>{formatDate(n.createdAt, "dateTime")}</time> · {n.author.name}
                </p>
                <p className="mt-1 whitespace-pre-line text-ink-800">{n.body}</p>
              </li>
            ))}
          </ol>
        )}
      </div>
    </Card>
  );
}
