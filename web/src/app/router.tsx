import { Suspense, lazy } from "react";
import { createBrowserRouter } from "react-router-dom";
import { HomePage } from "../features/home/components/HomePage";
import { Layout } from "./layout";
import { NotFoundPage } from "./not-found";

// The bench (d3, and three.js inside it) loads as its own chunks, so other pages stay light.
const BenchPage = lazy(() =>
  import("../features/bench/components/BenchPage").then((m) => ({ default: m.BenchPage })),
);

export const router = createBrowserRouter([
  {
    element: <Layout />,
    children: [
      { index: true, element: <HomePage /> },
      {
        path: "bench",
        element: (
          <Suspense fallback={<p className="text-graphite-soft">Opening the bench…</p>}>
            <BenchPage />
          </Suspense>
        ),
      },
      { path: "*", element: <NotFoundPage /> },
    ],
  },
]);
