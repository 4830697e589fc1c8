/** One multigraded piece of a module or quotient: its degree, dimension and Schur multiplicities. */
export interface ModuleCell {
  /** (x-degree, y-degree, θ-degree). */
  readonly degree: readonly [number, number, number];
  readonly dim: number;
  /** m_λ for λ in partitionList(n) order (absent when S_n does not act). */
  readonly multiplicities?: readonly number[];
}
