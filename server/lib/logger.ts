import pino from "pino";

/** Structured logs; credentials and cookies are redacted so a password never reaches a log line. */
export function createLogger(level: string, destination?: pino.DestinationStream) {
  return pino(
    {
      level,
      redact: {
        paths: [
          "req.headers.cookie",
          "req.headers.authorization",
          'res.headers["set-cookie"]',
          "password",
          "*.password",
          "newPassword",
          "*.newPassword",
        ],
        censor: "[redacted]",
      },
    },
    destination,
  );
}
export type Logger = ReturnType<typeof createLogger>;
