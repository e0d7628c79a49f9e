import type { ModelDefinition } from "./types";

// The turbulence closures Cormorant runs on the canonical cases. Citations as in
// the reference sheet §3 (bibliographic details there are partly from memory).
export const MODELS: ModelDefinition[] = [
  {
    key: "sa",
    name: "Spalart–Allmaras",
    family: "one-equation",
    reference: "Spalart & Allmaras 1994, La Recherche Aérospatiale No. 1, pp. 5–21 (constants: reference sheet §3.4)",
  },
  {
    key: "k-epsilon",
    name: "Standard k–ε",
    family: "two-equation",
    reference: "Launder & Spalding 1974, Comput. Methods Appl. Mech. Eng. 3:269 (constants: reference sheet §3.1)",
  },
  {
    key: "k-omega",
    name: "Wilcox k–ω (2006)",
    family: "two-equation",
    reference: "Wilcox 2006, Turbulence Modeling for CFD, 3rd ed.; AIAA J 46(11):2823, 2008 (constants: reference sheet §3.2)",
  },
  {
    key: "sst",
    name: "Menter SST k–ω",
    family: "two-equation",
    reference: "Menter 1994, AIAA J 32(8):1598–1605 (constants: reference sheet §3.3)",
  },
  {
    key: "lrr",
    name: "Launder–Reece–Rodi",
    family: "reynolds-stress",
    reference: "Launder, Reece & Rodi 1975, J. Fluid Mech. 68:537 (pressure–strain constants: reference sheet §3.5, from memory)",
  },
  {
    key: "ssg",
    name: "Speziale–Sarkar–Gatski",
    family: "reynolds-stress",
    reference: "Speziale, Sarkar & Gatski 1991, J. Fluid Mech. 227:245 (pressure–strain constants: reference sheet §3.5, from memory)",
  },
];
