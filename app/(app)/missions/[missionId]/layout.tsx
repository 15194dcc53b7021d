import { notFound } from "next/navigation";
import { missionPageExists } from "@/server/workspace/mission-page";

/** Every page of one mission answers 404 when the id is no mission of the person's team. */
export default async function MissionLayout({
  children,
  params,
}: {
  children: React.ReactNode;
  params: Promise<{ missionId: string }>;
}) {
  const { missionId } = await params;
  if (!(await missionPageExists(missionId))) notFound();
  return children;
}
