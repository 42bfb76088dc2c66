"use client";

import { DRESSED_LUMBER, GYPSUM_BOARD_THICKNESS, type GypsumBoard, type StudSize } from "@/takeoff";
import { Field, Select, TextInput } from "@/components/ui/field";
import { tape } from "@/lib/plans/window-list/length-text";
import { readWall, type WallDraft } from "@/lib/plans/window-list/new-opening";

const STUDS: StudSize[] = ["2x4", "2x6", "2x8"];
const BOARDS = Object.keys(GYPSUM_BOARD_THICKNESS) as GypsumBoard[];

/** The wall a window sits in; the setback it gives is previewed with the engine as it is typed. */
export function WallBuildUpFields({
  wall,
  onChange,
  errors,
}: {
  wall: WallDraft;
  onChange: (wall: WallDraft) => void;
  errors: Record<string, string>;
}) {
  const set = <K extends keyof WallDraft>(key: K, value: WallDraft[K]) => onChange({ ...wall, [key]: value });
  const preview = wall.frameDepth.trim() === "" ? null : readWall(wall);
  return (
    <div className="space-y-3 rounded-md border border-maple-200 bg-maple-50 p-3">
      <div className="grid grid-cols-2 gap-3 sm:grid-cols-5">
        <Field label="Studs" name="wall-stud">
          <Select name="wall-stud" value={wall.stud} onChange={(e) => set("stud", e.target.value as StudSize)}>
            {STUDS.map((s) => (
              <option key={s} value={s}>
                {s} ({tape(DRESSED_LUMBER[s].width)} deep)
              </option>
            ))}
          </Select>
        </Field>
        <Field label="Wallboard" name="wall-board">
          <Select name="wall-board" value={wall.wallboard} onChange={(e) => set("wallboard", e.target.value as GypsumBoard)}>
            {BOARDS.map((b) => (
              <option key={b} value={b}>
                {b}&quot; board
              </option>
            ))}
          </Select>
        </Field>
        <Field label="Layers" name="wall-layers" error={errors["wallBuildUp.wallboardLayers"]}>
          <TextInput name="wall-layers" inputMode="numeric" value={wall.layers} onChange={(e) => set("layers", e.target.value)} error={errors["wallBuildUp.wallboardLayers"]} />
        </Field>
        <Field label="Sheathing" name="wall-sheathing" error={errors["wallBuildUp.sheathing"]} hint="Only if the frame depth is measured from it">
          <TextInput name="wall-sheathing" placeholder="0" value={wall.sheathing} onChange={(e) => set("sheathing", e.target.value)} error={errors["wallBuildUp.sheathing"]} />
        </Field>
        <Field label="Window frame depth" name="wall-frame" error={errors["wallBuildUp.frameDepth"]}>
          <TextInput name="wall-frame" placeholder="3 1/4" value={wall.frameDepth} onChange={(e) => set("frameDepth", e.target.value)} error={errors["wallBuildUp.frameDepth"]} />
        </Field>
      </div>
      <p className="text-sm" aria-live="polite">
        {preview === null ? (
          <span className="text-graphite-600">Type the frame depth to see the setback.</span>
        ) : preview.ok ? (
          <>
            Setback (jamb extension width): <strong className="num text-base">{tape(preview.setback)}</strong>
          </>
        ) : (
          <span className="text-alarm-700">⚠ {Object.values(preview.fields)[0]}</span>
        )}
      </p>
    </div>
  );
}
