// @vitest-environment jsdom
// jsdom for a page origin (the client's requests are relative); answers come from the one network mock.
import { expect, test } from "vitest";
import { http, HttpResponse, network, watchUploads } from "../testing/network";
import { api, ApiError, apiRequest, attachmentName, downloadFile, toApiError } from "./api-client";

/** Every request answers `status` with `body`; returns the requests as the server received them. */
function answer(status: number, body?: unknown, contentType = "application/json") {
  const seen: Request[] = [];
  network.use(
    http.all("*", ({ request }) => {
      seen.push(request.clone());
      return new HttpResponse(body === undefined ? null : typeof body === "string" ? body : JSON.stringify(body), {
        status,
        headers: { "Content-Type": contentType },
      });
    }),
  );
  return seen;
}

test("a 400 in the API's error shape becomes an ApiError with status, code, message and fields", async () => {
  answer(400, {
    error: {
      code: "VALIDATION_FAILED",
      message: "Some fields need fixing.",
      fields: { distanceM: "Must be more than 0", stimpFt: "Must be between 5 and 16" },
    },
  });
  const error = await apiRequest("/api/reads", { method: "POST", body: {} }).catch((e: unknown) => e);
  expect(error).toBeInstanceOf(ApiError);
  expect(error).toMatchObject({
    name: "ApiError",
    status: 400,
    code: "VALIDATION_FAILED",
    message: "Some fields need fixing.",
    fields: { distanceM: "Must be more than 0", stimpFt: "Must be between 5 and 16" },
  });
});

test("an error shape without fields gives an empty fields object", async () => {
  answer(422, { error: { code: "BALL_CANNOT_STOP", message: "On this slope the ball would not stop." } });
  const error = await api.get("/api/reads").catch((e: unknown) => e);
  expect(error).toMatchObject({ status: 422, code: "BALL_CANNOT_STOP", message: "On this slope the ball would not stop.", fields: {} });
});

test("a body that is not the error shape still gives a readable ApiError", async () => {
  answer(502, "<html>Bad gateway</html>", "text/html");
  const error = await api.get("/api/me").catch((e: unknown) => e);
  expect(error).toMatchObject({ status: 502, code: "HTTP_502", message: "The server had a problem. Please try again.", fields: {} });
});

test("non-string field reasons are dropped and arrays give their first reason", () => {
  const error = toApiError(400, { error: { code: "BAD", message: "Bad", fields: { a: "why a", b: 3, c: ["why c", "more"] } } });
  expect(error.fields).toEqual({ a: "why a", c: "why c" });
});

test("a flat {code, message} body, as better-auth sends, is understood too", () => {
  expect(toApiError(401, { code: "UNAUTHORIZED", message: "Sign in first" })).toMatchObject({
    status: 401,
    code: "UNAUTHORIZED",
    message: "Sign in first",
  });
});

test("a JSON body is sent with its content type, same-origin credentials and the chosen method", async () => {
  const seen = answer(200, { user: { id: "u1" }, preferences: { units: "metric" } });
  const result = await api.patch<{ preferences: { units: string } }>("/api/me/preferences", { units: "metric" });
  expect(result.preferences.units).toBe("metric");
  expect(seen).toHaveLength(1);
  const request = seen[0]!;
  expect(request.url).toBe(`${window.location.origin}/api/me/preferences`);
  expect(request.method).toBe("PATCH");
  expect(await request.text()).toBe(JSON.stringify({ units: "metric" }));
  expect(request.credentials).toBe("same-origin");
  expect(request.headers.get("Content-Type")).toBe("application/json");
  expect(request.headers.get("Accept")).toBe("application/json");
});

test("a 204 resolves with undefined", async () => {
  answer(204);
  await expect(api.delete("/api/sessions/1")).resolves.toBeUndefined();
});

test("query parameters are added and undefined ones left out", async () => {
  const seen = answer(200, { messages: [] });
  await api.get("/api/dev/mail", { query: { to: "a@b.test", limit: 5, since: undefined } });
  expect(seen.map((r) => r.url.slice(window.location.origin.length))).toEqual(["/api/dev/mail?to=a%40b.test&limit=5"]);
});

test("a network failure becomes an ApiError with status 0", async () => {
  network.use(http.all("*", () => HttpResponse.error()));
  await expect(api.get("/api/me")).rejects.toMatchObject({ status: 0, code: "NETWORK_ERROR" });
});

test("a FormData body is passed through as it is, without a JSON content type", async () => {
  const seen = answer(200, { headers: ["date"] });
  const uploads = watchUploads();
  const form = new FormData();
  form.append("file", new Blob(["date\n2024-05-01\n"], { type: "text/csv" }), "putts.csv");
  await api.post("/api/csv/putts/preview", form);
  expect(uploads[0]!.form).toBe(form);
  // The browser writes the multipart type with its boundary; a JSON type would break the upload.
  expect(seen[0]!.headers.get("Content-Type")).toMatch(/^multipart\/form-data; boundary=/);
});

test("an error answer keeps its whole body, so extra fields such as row errors can be read", async () => {
  const body = {
    error: { code: "unprocessable", message: "2 row(s) have errors" },
    errors: [{ row: 1, line: 2, field: "date", message: "missing date" }],
  };
  answer(422, body);
  const error = await api.post("/api/csv/putts/import", new FormData()).catch((e: unknown) => e);
  expect(error).toMatchObject({ status: 422, message: "2 row(s) have errors", body });
});

test("attachmentName reads quoted, bare and RFC 5987 file names", () => {
  expect(attachmentName('attachment; filename="borrowline-putts-2024-05-01.csv"')).toBe("borrowline-putts-2024-05-01.csv");
  expect(attachmentName("attachment; filename=plain.csv")).toBe("plain.csv");
  expect(attachmentName("attachment; filename*=UTF-8''gr%C3%BCn.csv")).toBe("grün.csv");
  expect(attachmentName(null)).toBeNull();
  expect(attachmentName("inline")).toBeNull();
});

test("a failed download rejects with the API's error", async () => {
  answer(401, { error: { code: "UNAUTHORIZED", message: "Sign in first" } });
  await expect(downloadFile("/api/csv/putts/export")).rejects.toMatchObject({ status: 401, message: "Sign in first" });
});
