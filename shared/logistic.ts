// L2-regularised logistic regression, fitted by iteratively reweighted least squares (Newton's
// method) on ml-matrix. The intercept is never penalised. Standard errors come from the inverse
// of the penalised information matrix at the fit.
import { inverse, Matrix } from 'ml-matrix';

import { sigmoid } from './logistic-predict';

export type LogisticFit = {
  // Intercept first, then one per column of X.
  coefficients: number[];
  standardErrors: number[];
  iterations: number;
  converged: boolean;
};

export function fitLogistic(
  X: number[][],
  y: number[],
  options: { lambda?: number; maxIterations?: number; tolerance?: number } = {},
): LogisticFit {
  const lambda = options.lambda ?? 0;
  const maxIterations = options.maxIterations ?? 100;
  const tolerance = options.tolerance ?? 1e-10;
  const n = X.length;
  const k = (X[0]?.length ?? 0) + 1;
  const design = new Matrix(X.map((row) => [1, ...row]));
  const target = Matrix.columnVector(y);
  const penalty = Matrix.eye(k, k).mul(lambda);
  penalty.set(0, 0, 0);
  let beta = Matrix.zeros(k, 1);
  let information = Matrix.eye(k, k);
  let converged = false;
  let iterations = 0;

  for (; iterations < maxIterations; iterations++) {
    const eta = design.mmul(beta);
    const p = new Matrix(n, 1);
    const weighted = new Matrix(n, k);
    for (let i = 0; i < n; i++) {
      const pi = sigmoid(eta.get(i, 0));
      p.set(i, 0, pi);
      const w = Math.max(pi * (1 - pi), 1e-12);
      for (let j = 0; j < k; j++) weighted.set(i, j, design.get(i, j) * w);
    }
    information = design.transpose().mmul(weighted).add(penalty);
    const gradient = design.transpose().mmul(Matrix.sub(target, p)).sub(penalty.mmul(beta));
    const step = inverse(information).mmul(gradient);
    beta = beta.add(step);
    if (step.abs().max() < tolerance) {
      converged = true;
      iterations += 1;
      break;
    }
  }
  const covariance = inverse(information);
  return {
    coefficients: beta.getColumn(0),
    standardErrors: Array.from({ length: k }, (_, j) => Math.sqrt(Math.max(covariance.get(j, j), 0))),
    iterations,
    converged,
  };
}
