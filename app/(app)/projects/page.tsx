import type { Metadata } from "next";
import { ProjectList } from "@/components/projects/project-list";

export const metadata: Metadata = { title: "Projects" };

export default function ProjectsPage() {
  return (
    <main className="mx-auto max-w-7xl px-4 py-8">
      <h1 className="text-2xl font-semibold">Projects</h1>
      <p className="mt-1 text-sm text-ink-soft">Jobs your firm is designing, reviewing or building.</p>
      <ProjectList />
    </main>
  );
}
