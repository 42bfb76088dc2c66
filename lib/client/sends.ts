import { queryOptions } from "@tanstack/react-query";
import { z } from "zod";
import { request } from "./fetch";
import { takeoffKey, takeoffPath, type TakeoffScope } from "./takeoffs";

export const sendSchema = z.object({ to: z.string(), subject: z.string(), sentAt: z.string(), sentByName: z.string().nullable() });
const listSchema = z.object({ sends: z.array(sendSchema) });

export const sendsPath = (s: TakeoffScope) => `${takeoffPath(s)}/sends`;

/** The bid e-mails sent for one takeoff, cached as a bare list. */
export const sendsQuery = (s: TakeoffScope) =>
  queryOptions({
    queryKey: [...takeoffKey(s), "sends"] as const,
    queryFn: async () => listSchema.parse(await request(sendsPath(s))).sends,
  });

export const sendsKey = (s: TakeoffScope) => sendsQuery(s).queryKey;
