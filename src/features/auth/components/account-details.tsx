import { Card, CardTitle, ChoiceGroup, Spinner } from "../../../components/ui";
import type { Me, Units } from "../api/get-me";
import { useUpdatePreferences } from "../api/update-preferences";

const unitChoices = [
  { value: "imperial", label: "Feet and inches", description: "Distances like 12 ft 6 in; pace in feet past the hole." },
  { value: "metric", label: "Metres and centimetres", description: "Distances like 3.8 m; pace in centimetres past the hole." },
] as const;

const roleText: Record<Me["user"]["role"], string> = {
  player: "Player",
  coach: "Coach",
  admin: "Administrator",
};

export function AccountDetails({ me }: { me: Me }) {
  const update = useUpdatePreferences();
  const pendingUnits = update.isPending ? update.variables?.units : undefined;
  const units = pendingUnits ?? me.preferences.units;

  return (
    <div className="grid gap-6 lg:grid-cols-[1fr_1.3fr]">
      <Card>
        <CardTitle>Your account</CardTitle>
        <dl className="mt-5 grid gap-4">
          <div>
            <dt className="text-sm text-ink-500">Name</dt>
            <dd className="text-lg font-medium">{me.user.name}</dd>
          </div>
          <div>
            <dt className="text-sm text-ink-500">E-mail</dt>
            <dd className="text-lg font-medium break-all">{me.user.email}</dd>
            <dd className="mt-1 text-sm">
              {me.user.emailVerified ? (
                <span className="text-ok-600">Confirmed</span>
              ) : (
                <span className="text-warn-600">Not confirmed yet</span>
              )}
            </dd>
          </div>
          <div>
            <dt className="text-sm text-ink-500">Account type</dt>
            <dd className="text-lg font-medium">{roleText[me.user.role]}</dd>
          </div>
        </dl>
      </Card>
      <Card>
        <div className="flex items-center justify-between gap-3">
          <CardTitle>Units</CardTitle>
          {update.isPending ? <Spinner size="sm" label="Saving units" /> : null}
        </div>
        <p className="mt-1 text-ink-500">Reads and practice logs are shown in the units you choose. Borrowline remembers them for you.</p>
        <ChoiceGroup
          className="mt-5"
          columns={1}
          legend="Show lengths in"
          choices={unitChoices}
          // aria-disabled, not disabled, while saving: the focused choice keeps the focus (issue 18).
          inputProps={{ name: "units", "aria-disabled": update.isPending || undefined }}
          value={units}
          onValueChange={(next) => {
            if (!update.isPending) update.mutate({ units: next as Units });
          }}
        />
        {update.isError ? <p className="mt-3 text-sm font-medium text-bad-600">{update.error.message}</p> : null}
      </Card>
    </div>
  );
}
