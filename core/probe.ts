import { readFileSync } from "node:fs"; import { errors } from "../api/errors"; export const y = [readFileSync, errors, process.env];
