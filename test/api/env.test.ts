import { execFile } from "node:child_process";
import { promisify } from "node:util";
import { describe, expect, it } from "vitest";
import { EnvError, parseEnv } from "../../api/env";

const run = promisify(execFile);

describe("environment parsing", () => {
  it("when DATABASE_URL is missing and PORT is not a number, then the error lists both by name", () => {
    let caught: unknown;
    try {
      parseEnv({ PORT: "eighty" });
    } catch (error) {
      caught = error;
    }
    expect(caught).toBeInstanceOf(EnvError);
    const message = (caught as EnvError).message;
    expect(message).toContain("the environment is not valid");
    expect(message).toMatch(/- PORT: /);
    expect(message).toMatch(/- DATABASE_URL: is required/);
    expect((caught as EnvError).problems).toHaveLength(2);
  });

  it("when DATABASE_URL is not a postgres URL, then the message says what it must start with", () => {
    expect(() => parseEnv({ DATABASE_URL: "mysql://x@y/z" })).toThrow(
      /DATABASE_URL: must start with postgres:\/\/ or postgresql:\/\//,
    );
  });

  it("when only DATABASE_URL is given, then the defaults fill the rest", () => {
    const env = parseEnv({ DATABASE_URL: "postgres://u:p@127.0.0.1:5432/db", LOG_LEVEL: "" });
    expect(env).toMatchObject({ PORT: 4650, HOST: "127.0.0.1", NODE_ENV: "development", LOG_LEVEL: "info" });
  });

  it("when the API process starts with a bad environment, then it prints the list and exits 1", async () => {
    const result = await run(process.execPath, ["--import", "tsx", "api/main.ts"], {
      env: { PATH: process.env.PATH, PORT: "70000" },
    }).catch((error: { code: number; stderr: string }) => error);
    expect("code" in result && result.code).toBe(1);
    expect(result.stderr).toContain("Sigmacube cannot start");
    expect(result.stderr).toMatch(/PORT: .*65535/);
    expect(result.stderr).toContain("DATABASE_URL: is required");
  });
});
