// Minimal typings for the registry reference libraries that ship without them.
// Only what the analysis tests call is declared.
declare module "jstat" {
  export const jStat: {
    normal: {
      cdf(x: number, mean: number, std: number): number;
    };
  };
}

declare module "ml-regression-theil-sen" {
  export class TheilSenRegression {
    constructor(x: number[], y: number[]);
    slope: number;
    intercept: number;
  }
}
