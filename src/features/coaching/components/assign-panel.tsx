import { formatDate } from "#shared/format";
import { useId, useState, type FormEvent } from "react";
import type { Assignment } from "#shared/schemas/assignments";
import type { Ladder } from "#shared/schemas/ladders";
import {
  Alert,
  Button,
  ButtonLink,
  Card,
  CardTitle,
  ChoiceGroup,
  InputField,
  SelectField,
  Spinner,
  TextLink,
} from "../../../components/ui";
import { paths } from "../../../config/paths";
import { isApiError } from "../../../lib/api-client";
import { useAssignLadder } from "../api/assign-ladder";
import { useCoachSquads } from "../api/get-squads";

function Assigned({ assignments, onAgain }: { assignments: Assignment[]; onAgain: () => void }) {
  const due = assignments[0]?.dueDate;
  return (
    <Alert tone="success" title={`Given to ${assignments.length} player${assignments.length === 1 ? "" : "s"}`}>
      <ul className="mt-1 list-disc pl-5">
        {assignments.map((a) => (
          <li key={a.id}>{a.player.name}</li>
        ))}
      </ul>
      <p className="mt-2">
        {due ? `Due ${formatDate(due, "long")}.` : "No due date."} Each player has an e-mail with a link to the ladder.
      </p>
      <div className="mt-3 flex flex-wrap gap-2">
        <ButtonLink to={paths.coach.href()} size="sm">
          Follow progress
        </ButtonLink>
        <Button size="sm" variant="ghost" onClick={onAgain}>
          Give it to more players
        </Button>
      </div>
    </Alert>
  );
}

/** Gives the ladder to chosen players of the coach's squads, or to a whole squad, with an optional due date. */
export function AssignPanel({ ladder }: { ladder: Ladder }) {
  const id = useId();
  const squads = useCoachSquads();
  const assign = useAssignLadder();
  const [mode, setMode] = useState<"squad" | "players">("squad");
  const [squadId, setSquadId] = useState("");
  const [chosen, setChosen] = useState<Set<string>>(new Set());
  const [dueDate, setDueDate] = useState("");
  const [problem, setProblem] = useState<string | null>(null);

  const list = squads.data?.squads ?? [];
  const withPlayers = list.filter((s) => s.members.length > 0);
  const effectiveSquad = squadId || withPlayers[0]?.id || "";

  const submit = (event: FormEvent) => {
    event.preventDefault();
    setProblem(null);
    if (mode === "players" && chosen.size === 0) {
      setProblem("Choose at least one player.");
      return;
    }
    if (mode === "squad" && !effectiveSquad) {
      setProblem("Choose a squad.");
      return;
    }
    const target = mode === "squad" ? { squadId: effectiveSquad } : { playerIds: [...chosen] };
    assign.mutate(
      { ladderId: ladder.id, input: { ...target, ...(dueDate ? { dueDate } : {}) } },
      {
        onError: (error) =>
          setProblem(
            isApiError(error)
              ? Object.values(error.fields)[0]
                ? `${error.message} ${Object.values(error.fields)[0]}`
                : error.message
              : "Could not give the ladder.",
          ),
      },
    );
  };

  if (assign.data) {
    return (
      <Card>
        <CardTitle>Give to players</CardTitle>
        <div className="mt-4">
          <Assigned
            assignments={assign.data.assignments}
            onAgain={() => {
              assign.reset();
              setChosen(new Set());
            }}
          />
        </div>
      </Card>
    );
  }

  return (
    <Card>
      <CardTitle>Give to players</CardTitle>
      <p className="mt-1 text-ink-500">Each player gets their own copy as the ladder is now; later edits do not change it.</p>
      {squads.isPending ? (
        <div className="py-6">
          <Spinner label="Loading your squads" />
        </div>
      ) : withPlayers.length === 0 ? (
        <Alert tone="info" className="mt-4" title="No players yet">
          Ladders go to players in your squads. <TextLink to={paths.squads.href()}>Invite players to a squad</TextLink> first.
        </Alert>
      ) : (
        <form noValidate onSubmit={submit} className="mt-4 flex flex-col gap-5" aria-label={`Give ${ladder.name} to players`}>
          <ChoiceGroup
            legend="Who"
            columns={2}
            choices={[
              { value: "squad", label: "A whole squad", description: "Everyone in it now." },
              { value: "players", label: "Chosen players", description: "Pick them from your squads." },
            ]}
            inputProps={{ name: `${id}-mode` }}
            value={mode}
            onValueChange={(v) => setMode(v as "squad" | "players")}
          />
          {mode === "squad" ? (
            <SelectField
              label="Squad"
              value={effectiveSquad}
              onChange={(e) => setSquadId(e.target.value)}
              options={withPlayers.map((s) => ({
                value: s.id,
                label: `${s.name} (${s.members.length} player${s.members.length === 1 ? "" : "s"})`,
              }))}
            />
          ) : (
            <fieldset className="flex flex-col gap-3">
              <legend className="mb-1 text-sm font-medium text-ink-800">Players</legend>
              {withPlayers.map((s) => (
                <div key={s.id}>
                  <p className="mb-1 text-sm text-ink-500">{s.name}</p>
                  <ul className="grid gap-1 sm:grid-cols-2">
                    {s.members.map((m) => {
                      const inputId = `${id}-${s.id}-${m.id}`;
                      return (
                        <li key={m.id}>
                          <label
                            htmlFor={inputId}
                            className="flex min-h-11 cursor-pointer items-center gap-3 rounded-lg px-2 hover:bg-ink-900/5"
                          >
                            <input
                              id={inputId}
                              type="checkbox"
                              className="size-5 accent-ink-900"
                              checked={chosen.has(m.id)}
                              onChange={(e) => {
                                const next = new Set(chosen);
                                if (e.target.checked) next.add(m.id);
                                else next.delete(m.id);
                                setChosen(next);
                              }}
                            />
                            {m.name}
                          </label>
                        </li>
                      );
                    })}
                  </ul>
                </div>
              ))}
            </fieldset>
          )}
          <InputField
            label="Due date (optional)"
            type="date"
            value={dueDate}
            onChange={(e) => setDueDate(e.target.value)}
            containerClassName="max-w-xs"
          />
          {problem ? <Alert tone="error">{problem}</Alert> : null}
          <Button type="submit" loading={assign.isPending} loadingText="Giving…" className="self-start">
            Give {ladder.name}
          </Button>
        </form>
      )}
    </Card>
  );
}
