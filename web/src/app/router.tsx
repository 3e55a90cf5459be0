import { createBrowserRouter } from "react-router-dom";
import { HomePage } from "../features/home/components/HomePage";
import { Layout } from "./layout";
import { NotFoundPage } from "./not-found";

export const router = createBrowserRouter([
  {
    element: <Layout />,
    children: [
      { index: true, element: <HomePage /> },
      { path: "*", element: <NotFoundPage /> },
    ],
  },
]);
