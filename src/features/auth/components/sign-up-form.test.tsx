// @vitest-environment jsdom
import "@testing-library/jest-dom/vitest";
import { afterEach, beforeEach, expect, test, vi } from "vitest";
import { cleanup, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { renderRoute } from "../../../testing/render";
import { SignUpForm } from "./sign-up-form";

const { signUpEmail } = vi.hoisted(() => ({ signUpEmail: vi.fn() }));
vi.mock("../../../lib/auth-client", () => ({ authClient: { signUp: { email: signUpEmail } } }));

beforeEach(() => {
  signUpEmail.mockReset();
});
afterEach(() => {
  cleanup();
});

function renderForm(at = "/sign-up") {
  return renderRoute(<SignUpForm />, {
    at,
    routes: [
      { path: "/", element: <p>Home page</p> },
      { path: "/account", element: <p>Account page</p> },
    ],
  });
}

async function fillIn(user: ReturnType<typeof userEvent.setup>, values: { name?: string; email?: string; password?: string }) {
  if (values.name) await user.type(screen.getByLabelText("Name"), values.name);
  if (values.email) await user.type(screen.getByLabelText("E-mail"), values.email);
  if (values.password) await user.type(screen.getByLabelText("Password"), values.password);
}

test("submitting an empty form names every missing detail, including the role, and sends nothing", async () => {
  const user = userEvent.setup();
  renderForm();
  await user.click(screen.getByRole("button", { name: "Create account" }));

  expect(await screen.findByText("Enter your name.")).toBeInTheDocument();
  expect(screen.getByLabelText("Name")).toHaveAccessibleDescription("Enter your name.");
  expect(screen.getByLabelText("E-mail")).toHaveAccessibleDescription("Enter your e-mail address.");
  expect(screen.getByLabelText("Password")).toHaveAccessibleDescription("Use at least 8 characters.");
  expect(screen.getByRole("group", { name: "How will you use Borrowline?" })).toHaveAccessibleDescription(
    "Choose whether you are a player or a coach.",
  );
  expect(screen.getByLabelText("Name")).toHaveAttribute("aria-invalid", "true");
  expect(signUpEmail).not.toHaveBeenCalled();
});

test("a malformed e-mail and a short password are reported beside their fields", async () => {
  const user = userEvent.setup();
  renderForm();
  await fillIn(user, { name: "Leena Park", email: "leena@", password: "short" });
  await user.click(screen.getByRole("radio", { name: /I am a player/ }));
  await user.click(screen.getByRole("button", { name: "Create account" }));

  expect(await screen.findByText("Enter a valid e-mail address.")).toBeInTheDocument();
  expect(screen.getByLabelText("Password")).toHaveAccessibleDescription("Use at least 8 characters.");
  expect(signUpEmail).not.toHaveBeenCalled();
});

test("the role choice is required even when everything else is filled in", async () => {
  const user = userEvent.setup();
  renderForm();
  await fillIn(user, { name: "Leena Park", email: "leena@example.test", password: "a-long-password" });
  await user.click(screen.getByRole("button", { name: "Create account" }));

  expect(await screen.findByText("Choose whether you are a player or a coach.")).toBeInTheDocument();
  expect(screen.getByRole("radio", { name: /I am a player/ })).toHaveAttribute("aria-invalid", "true");
  expect(signUpEmail).not.toHaveBeenCalled();
});

test("a complete form sends name, e-mail, password and role, then goes to the home page", async () => {
  signUpEmail.mockResolvedValue({ data: { token: "t", user: { id: "u1" } }, error: null });
  const user = userEvent.setup();
  renderForm();
  await fillIn(user, { name: "  Dana Whitcombe ", email: "dana@example.test", password: "correct horse" });
  await user.click(screen.getByRole("radio", { name: /I am a coach/ }));
  await user.click(screen.getByRole("button", { name: "Create account" }));

  expect(await screen.findByText("Home page")).toBeInTheDocument();
  expect(signUpEmail).toHaveBeenCalledTimes(1);
  expect(signUpEmail).toHaveBeenCalledWith({
    name: "Dana Whitcombe",
    email: "dana@example.test",
    password: "correct horse",
    accountType: "coach",
  });
});

test("after signing up from a guarded page the user is sent back to it", async () => {
  signUpEmail.mockResolvedValue({ data: { token: "t", user: { id: "u1" } }, error: null });
  const user = userEvent.setup();
  renderForm("/sign-up?next=%2Faccount");
  await fillIn(user, { name: "Ivo Marsh", email: "ivo@example.test", password: "correct horse" });
  await user.click(screen.getByRole("radio", { name: /I am a player/ }));
  await user.click(screen.getByRole("button", { name: "Create account" }));

  expect(await screen.findByText("Account page")).toBeInTheDocument();
});

test("an e-mail already in use is shown beside the e-mail field", async () => {
  signUpEmail.mockResolvedValue({
    data: null,
    error: { code: "USER_ALREADY_EXISTS_USE_ANOTHER_EMAIL", message: "User already exists. Use another email.", status: 422 },
  });
  const user = userEvent.setup();
  renderForm();
  await fillIn(user, { name: "Sam Okoro", email: "sam@example.test", password: "correct horse" });
  await user.click(screen.getByRole("radio", { name: /I am a player/ }));
  await user.click(screen.getByRole("button", { name: "Create account" }));

  expect(await screen.findByText(/An account with this e-mail already exists/)).toBeInTheDocument();
  expect(screen.getByLabelText("E-mail")).toHaveAccessibleDescription(/already exists/);
  expect(screen.queryByText("Home page")).not.toBeInTheDocument();
});

test("a server error that belongs to no field shows as an alert over the form", async () => {
  signUpEmail.mockResolvedValue({ data: null, error: { code: "FAILED_TO_CREATE_USER", message: "Failed to create user", status: 500 } });
  const user = userEvent.setup();
  renderForm();
  await fillIn(user, { name: "Ruth Calder", email: "ruth@example.test", password: "correct horse" });
  await user.click(screen.getByRole("radio", { name: /I am a player/ }));
  await user.click(screen.getByRole("button", { name: "Create account" }));

  expect(await screen.findByRole("alert")).toHaveTextContent("Failed to create user");
});

test("the button shows that the account is being created while the server answers", async () => {
  let finish: (value: unknown) => void = () => {};
  signUpEmail.mockReturnValue(new Promise((resolve) => (finish = resolve)));
  const user = userEvent.setup();
  renderForm();
  await fillIn(user, { name: "Ruth Calder", email: "ruth@example.test", password: "correct horse" });
  await user.click(screen.getByRole("radio", { name: /I am a player/ }));
  await user.click(screen.getByRole("button", { name: "Create account" }));

  const busy = await screen.findByRole("button", { name: /Creating your account/ });
  // Busy, not disabled: the focused button keeps the focus while the server answers.
  expect(busy).toHaveAttribute("aria-disabled", "true");
  finish({ data: { token: "t" }, error: null });
  expect(await screen.findByText("Home page")).toBeInTheDocument();
});
