namespace FilterQA.Core.Resonators;

/// <summary>Outcome of <see cref="BvdFitter"/>: per arm fs, R and Q (arm 0 is the main mode), C0 and how the solver ended.</summary>
internal sealed record BvdFitResult(double[] FsHz, double[] ROhm, double[] Q, double C0F, bool Converged, int Iterations, double RmsResidual);
