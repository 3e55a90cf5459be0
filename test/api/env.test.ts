import { execFile } from "node:child_process";
import { promisify } from "node:util";
import { describe, expect, it } from "vitest";
import { EnvError, parseEnv } from "../../api/env";

const DATABASE_URL = "postgres://u:p@127.0.0.1:5432/db";

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

  it("when HOST is not loopback and there is no SMTP_URL, then start-up is refused naming SMTP_URL and the setting that allows it", () => {
    for (const HOST of ["0.0.0.0", "::", "192.0.2.7", "sigmacube.example"]) {
      let caught: unknown;
      try {
        parseEnv({ DATABASE_URL, HOST });
      } catch (error) {
        caught = error;
      }
      expect(caught, HOST).toBeInstanceOf(EnvError);
      expect((caught as EnvError).message).toMatch(
        /SMTP_URL: is required when HOST .* is not a loopback address/,
      );
      expect((caught as EnvError).message).toContain("SIGMACUBE_FAKE_MAILBOX=1");
    }
  });

  it("when HOST is loopback, SMTP_URL is set, or SIGMACUBE_FAKE_MAILBOX=1 says so, then the server may start", () => {
    for (const HOST of ["127.0.0.1", "127.0.0.2", "localhost", "::1", "[::1]"]) {
      expect(parseEnv({ DATABASE_URL, HOST }).HOST).toBe(HOST);
    }
    expect(parseEnv({ DATABASE_URL, HOST: "0.0.0.0", SMTP_URL: "smtp://mail.example:25" }).SMTP_URL).toBe(
      "smtp://mail.example:25",
    );
    expect(
      parseEnv({ DATABASE_URL, HOST: "0.0.0.0", SIGMACUBE_FAKE_MAILBOX: "1" }).SIGMACUBE_FAKE_MAILBOX,
    ).toBe(true);
    expect(() => parseEnv({ DATABASE_URL, HOST: "0.0.0.0", SIGMACUBE_FAKE_MAILBOX: "0" })).toThrow(
      /SMTP_URL/,
    );
  });

  it("when TRUST_PROXY lists addresses and ranges, then they are kept; a wrong entry is named; unset trusts none", () => {
    expect(parseEnv({ DATABASE_URL }).TRUST_PROXY).toEqual([]);
    expect(
      parseEnv({ DATABASE_URL, TRUST_PROXY: "10.0.0.0/8, 192.0.2.1,loopback,2001:db8::/32" }).TRUST_PROXY,
    ).toEqual(["10.0.0.0/8", "192.0.2.1", "loopback", "2001:db8::/32"]);
    expect(() => parseEnv({ DATABASE_URL, TRUST_PROXY: "10.0.0.0/33" })).toThrow(
      /TRUST_PROXY.*"10\.0\.0\.0\/33"/s,
    );
    expect(() => parseEnv({ DATABASE_URL, TRUST_PROXY: "everyone" })).toThrow(/TRUST_PROXY/);
  });

  it("when the API process starts on a public interface without SMTP_URL, then it prints why and exits 1", async () => {
    const result = await run(process.execPath, ["--import", "tsx", "api/main.ts"], {
      env: { PATH: process.env.PATH, HOST: "0.0.0.0", DATABASE_URL },
    }).catch((error: { code: number; stderr: string }) => error);
    expect("code" in result && result.code).toBe(1);
    expect(result.stderr).toContain("Sigmacube cannot start");
    expect(result.stderr).toMatch(/SMTP_URL: is required when HOST \(0\.0\.0\.0\)/);
  });
});
