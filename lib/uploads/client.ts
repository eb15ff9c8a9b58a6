"use client";

import { generateReactHelpers } from "@uploadthing/react";
import type { UploadRouter } from "@/app/api/uploadthing/core";

/** Typed upload hook for our routes (app/api/uploadthing); it posts to /api/uploadthing on this origin. */
export const { useUploadThing } = generateReactHelpers<UploadRouter>();
