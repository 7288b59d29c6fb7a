import type { Role } from "@/lib/permissions/roles";
import type { ProjectStatus } from "@/lib/projects/project-status";

/**
 * The demo: Lantern & Loom Creature Works, an invented shop that builds parade and stage creatures from foam, with
 * one person per role, and a second invented shop (Tideglass Prop Foundry) owned by an outsider, used to check that
 * shops never see each other's data. All names, clients and shows are made up for Peelform.
 */
export const DEMO_PASSWORD = "peelform-demo";

export interface DemoUser {
  email: string;
  name: string;
}

export interface DemoProject {
  name: string;
  client: string | null;
  dueDate: string | null;
  status: ProjectStatus;
  notes: string | null;
}

export interface DemoShop {
  name: string;
  members: { email: string; role: Role }[];
  projects: DemoProject[];
}

export const DEMO_USERS: DemoUser[] = [
  { email: "owner@peelform.test", name: "Marguerite Okonkwo-Hale" },
  { email: "designer@peelform.test", name: "Teodor Vance" },
  { email: "reviewer@peelform.test", name: "Priya Lindqvist" },
  { email: "fabricator@peelform.test", name: "Joaquín Brandt" },
  { email: "outsider@peelform.test", name: "Hollis Quarry" },
];

export const DEMO_SHOP: DemoShop = {
  name: "Lantern & Loom Creature Works",
  members: [
    { email: "owner@peelform.test", role: "owner" },
    { email: "designer@peelform.test", role: "designer" },
    { email: "reviewer@peelform.test", role: "reviewer" },
    { email: "fabricator@peelform.test", role: "fabricator" },
  ],
  projects: [
    {
      name: "Ember, the lantern moth",
      client: "Riverside Midsummer Parade",
      dueDate: "2027-06-19",
      status: "patterning",
      notes:
        "Walk-around moth with a lit thorax. Body shell in 10 mm EVA, antennae in 5 mm. Keep the wearer's sightline " +
        "through the mesh panel under the head; wings hinge at the shoulder harness.",
    },
    {
      name: "Harbour kraken tentacles (set of six)",
      client: "Saltmarsh Players — The Drowned Bell",
      dueDate: "2027-03-12",
      status: "in_review",
      notes: "Six tapering tentacles, 1.8 m to 2.4 m, upholstery foam over a flexible spine. Suckers cast separately.",
    },
    {
      name: "Stag king antlers",
      client: "Northgate Opera — A Winter's Crown",
      dueDate: "2027-01-29",
      status: "approved",
      notes: "Headpiece must stay under 900 g: 6 mm EVA, hollow tines, weight check after priming.",
    },
    {
      name: "Snail shell float topper",
      client: "Willow Street Lantern Festival",
      dueDate: "2027-09-04",
      status: "planning",
      notes: "Scale the 12 cm sculpt to 2.1 m across; spiral seam along the whorl; rigid foam core in two halves.",
    },
    {
      name: "Foxglove fairy wings",
      client: "Hearth & Hollow Puppet Theatre",
      dueDate: "2026-12-18",
      status: "building",
      notes: null,
    },
    {
      name: "Clockwork owl mask",
      client: null,
      dueDate: null,
      status: "delivered",
      notes: "Shop sample for the open day; half mask, 4 mm EVA with a heat-formed beak.",
    },
  ],
};

export const OUTSIDER_SHOP: DemoShop = {
  name: "Tideglass Prop Foundry",
  members: [{ email: "outsider@peelform.test", role: "owner" }],
  projects: [
    {
      name: "Coral throne backrest",
      client: "Tideglass Aquarium Gala",
      dueDate: "2027-05-02",
      status: "planning",
      notes: "Branching coral fan, 1.4 m tall, 10 mm EVA on a plywood back.",
    },
  ],
};
