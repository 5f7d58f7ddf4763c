import { RequireAuth } from "../../../features/auth/components/require-auth";
import { MyLaddersPage } from "../../../features/coaching/components/my-ladders-page";

export function MyLaddersRoute() {
  return (
    <>
      <title>My ladders · Borrowline</title>
      <RequireAuth roles={["player"]}>
        <MyLaddersPage />
      </RequireAuth>
    </>
  );
}

export { MyLaddersRoute as Component };
