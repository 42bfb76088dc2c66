/** A JSON answer whose body is already serialised (see lib/server/takeoffs/takeoff-json.ts). */
export const jsonText = (body: string, status = 200) =>
  new Response(body, { status, headers: { "content-type": "application/json" } });
