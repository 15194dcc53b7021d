import type { Metadata } from "next";
import { ToolsBoard } from "./_components/tools-board";

export const metadata: Metadata = {
  title: "Engineering tools",
  description:
    "Wavelength and grid, resonator sizing, drift budget, receiver noise and channel notation: helpers with their working and sources.",
};

export default function ToolsPage() {
  return (
    <main className="mx-auto max-w-6xl px-6 py-8">
      <h1 className="text-2xl font-semibold tracking-tight text-ink">Engineering tools</h1>
      <p className="mt-2 max-w-3xl text-sm text-ink-soft">
        Small calculators for the numbers a plan needs: wavelength and grid, resonator sizing, drift budget, receiver
        noise and channel notation. Each shows its formula, inputs and sources. In the mission workspace the same
        helpers sit beside the fields they feed, and <em>Apply</em> fills the field.
      </p>
      <ToolsBoard />
    </main>
  );
}
