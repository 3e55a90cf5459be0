import { Router } from "express";
import type { AppContext } from "../../context";
import { healthHandler } from "./handler";

export function healthRoutes(context: AppContext): Router {
  const router = Router();
  router.get("/health", healthHandler(context.sequelize, context.version));
  return router;
}
