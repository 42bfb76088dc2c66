const entities: Record<string, string> = { "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" };

/** For the few places we build HTML by hand (e-mail bodies): names people type are text, never markup. */
export const escapeHtml = (value: string) => value.replace(/[&<>"']/g, (c) => entities[c]!);
