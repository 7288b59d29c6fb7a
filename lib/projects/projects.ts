import { AppError } from "@/lib/errors/app-error";
import type { ProjectStatus } from "@/lib/projects/project-status";
import type { ProjectCreateInput, ProjectUpdateInput } from "@/lib/validations/projects";
import { getSequelize } from "@/lib/db/sequelize";
import { Project } from "@/models";

/** The API shape of a project (see the API contract). */
export interface ProjectDto {
  id: string;
  name: string;
  client: string | null;
  dueDate: string | null;
  notes: string | null;
  status: ProjectStatus;
  createdAt: string;
  updatedAt: string;
}

export function toProjectDto(p: Project): ProjectDto {
  return {
    id: p.id,
    name: p.name,
    client: p.client ?? null,
    dueDate: p.dueDate ?? null,
    notes: p.notes ?? null,
    status: p.status,
    createdAt: p.createdAt.toISOString(),
    updatedAt: p.updatedAt.toISOString(),
  };
}

/** Every project of a shop, soonest due first (undated last), then newest. */
export async function listProjects(shopId: string): Promise<ProjectDto[]> {
  getSequelize();
  const rows = await Project.findAll({
    where: { shopId },
    order: [["dueDate", "ASC NULLS LAST"], ["createdAt", "DESC"]],
  });
  return rows.map(toProjectDto);
}

export async function createProject(shopId: string, userId: string, input: ProjectCreateInput): Promise<ProjectDto> {
  getSequelize();
  const p = await Project.create({
    shopId,
    createdById: userId,
    name: input.name,
    client: input.client ?? null,
    dueDate: input.dueDate ?? null,
    notes: input.notes ?? null,
    status: input.status ?? "planning",
  });
  return toProjectDto(p);
}

/** A project of this shop; another shop's id answers NOT_FOUND exactly like an unknown one. */
export async function findProject(shopId: string, id: string): Promise<Project> {
  getSequelize();
  const p = await Project.findOne({ where: { id, shopId } });
  if (!p) throw new AppError("NOT_FOUND", "No such project in this shop.");
  return p;
}

export async function updateProject(shopId: string, id: string, input: ProjectUpdateInput): Promise<ProjectDto> {
  const p = await findProject(shopId, id);
  const changes: Partial<Pick<Project, "name" | "client" | "dueDate" | "notes" | "status">> = {};
  if (input.name !== undefined) changes.name = input.name;
  if (input.client !== undefined) changes.client = input.client;
  if (input.dueDate !== undefined) changes.dueDate = input.dueDate;
  if (input.notes !== undefined) changes.notes = input.notes;
  if (input.status !== undefined) changes.status = input.status;
  await p.update(changes);
  return toProjectDto(p);
}

export async function deleteProject(shopId: string, id: string): Promise<void> {
  const p = await findProject(shopId, id);
  await p.destroy();
}
