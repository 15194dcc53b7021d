"use client";

import { useFormMetadata } from "@conform-to/react";
import { useState } from "react";
import { ChannelNotation, DriftBudget, ReceiverNoise, ResonatorSizing, WavelengthGrid } from "@/components/tools";
import { buttonClass } from "./ui";

/** Which helper sits beside a field (see entity-specs.ts). */
export type HelperKind = "drift" | "resonator" | "fsr-shift" | "receiver" | "wavelength" | "notation";

const TITLE: Record<HelperKind, string> = {
  drift: "drift budget",
  resonator: "resonator sizing",
  "fsr-shift": "resonator sizing",
  receiver: "receiver noise",
  wavelength: "wavelength and grid",
  notation: "channel notation",
};

/** A number from the form's current text, or undefined when empty or not a finite positive number. */
function positive(v: unknown): number | undefined {
  if (typeof v !== "string" && typeof v !== "number") return undefined;
  const n = Number(v);
  return String(v).trim() !== "" && Number.isFinite(n) && n > 0 ? n : undefined;
}

/**
 * The helper toggle beside a form field. "Apply" writes the helper's result
 * into the form fields (conform's update intent); nothing is saved until the
 * user saves the form, so the server re-checks it as any other edit.
 */
export function FieldHelper({ kind, fieldName }: { kind: HelperKind; fieldName: string }) {
  const form = useFormMetadata();
  const [open, setOpen] = useState(false);
  const [applied, setApplied] = useState<string | null>(null);
  const values = (form.value ?? {}) as Record<string, unknown>;
  const set = (name: string, value: number | string) => form.update({ name, value: value as never });
  const done = (what: string) => {
    setApplied(what);
    setOpen(false);
  };
  const panelId = `${form.id}-${fieldName.replace(/\W/g, "-")}-helper`;

  let body: React.ReactNode = null;
  if (open) {
    if (kind === "drift") {
      body = (
        <DriftBudget
          initialCarrierTHz={positive(values.carrierTHz) ?? 193.4}
          initialStepMHz={positive(values.stepMHz) ?? 0}
          onApply={(mhz) => {
            set("driftMHz", mhz);
            done(`Drift set to ${mhz} MHz`);
          }}
        />
      );
    } else if (kind === "resonator" || kind === "fsr-shift") {
      const applyShift = (mhzPerK: number) => {
        const v = Number(mhzPerK.toPrecision(4));
        set("fsrShiftMHzPerK", v);
        done(`FSR shift set to ${v} MHz/K`);
      };
      body = (
        <ResonatorSizing
          initialFsrGHz={positive(values.fsrGHz) ?? 183.31}
          initialLoadedQ={positive(values.loadedQ) ?? 1e7}
          onApply={
            kind === "resonator"
              ? (v) => {
                  set("fsrGHz", Number(v.fsrGHz.toPrecision(8)));
                  set("loadedQ", Number(v.loadedQ.toPrecision(6)));
                  done(`FSR and loaded Q filled in`);
                }
              : undefined
          }
          onApplyFsrShift={applyShift}
        />
      );
    } else if (kind === "receiver") {
      body = (
        <ReceiverNoise
          initialRfGHz={positive(values.centerGHz) ?? 183.31}
          onApply={(k) => {
            set("receiverK", k);
            done(`Receiver noise set to ${k} K`);
          }}
        />
      );
    } else if (kind === "wavelength") {
      body = (
        <WavelengthGrid
          initialTHz={positive(values.carrierTHz) ?? 193.4}
          applyLabel="Apply carrier"
          onApply={(thz) => {
            set("carrierTHz", thz);
            done(`Carrier set to ${thz} THz`);
          }}
        />
      );
    } else {
      body = (
        <ChannelNotation
          onApply={(ch) => {
            set("centerGHz", ch.centerGHz);
            set("dsbOffsetGHz", ch.dsbOffsetGHz === null ? "" : ch.dsbOffsetGHz);
            set("bandwidthMHz", ch.bandwidthMHz);
            done("Centre, DSB offset and bandwidth filled in");
          }}
        />
      );
    }
  }

  return (
    <div className="mt-1">
      <button
        type="button"
        className={`${buttonClass.quiet} text-xs`}
        aria-expanded={open}
        aria-controls={panelId}
        onClick={() => {
          setOpen((o) => !o);
          setApplied(null);
        }}
      >
        {open ? `Hide the ${TITLE[kind]} helper` : `Helper: ${TITLE[kind]}`}
      </button>
      {applied ? (
        <p className="text-xs text-ink-soft" role="status">
          {applied}. Save to re-check the plan.
        </p>
      ) : null}
      {open ? (
        <div
          id={panelId}
          className="mt-2"
          onKeyDown={(e) => {
            // Enter in a helper input must not submit (save) the surrounding form.
            if (e.key === "Enter" && e.target instanceof HTMLInputElement) e.preventDefault();
          }}
        >
          {body}
        </div>
      ) : null}
    </div>
  );
}
