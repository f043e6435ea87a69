using System.Numerics;
using MathNet.Numerics.LinearAlgebra;

namespace FilterQA.Core.Formats.Touchstone;

/// <summary>
/// Converts impedance (Z) or admittance (Y) matrices to scattering (S) parameters with a real reference
/// impedance per port: S = (z − I)(z + I)⁻¹ for normalised z, S = (I − y)(I + y)⁻¹ for normalised y
/// (Pozar, Microwave Engineering, section 4.3, with z = D^−½·Z·D^−½ and y = D^½·Y·D^½, D = diag(Z0)).
/// </summary>
internal static class ImmittanceConversion
{
    /// <summary>
    /// Replaces the row-major n×n <paramref name="matrix"/> (Z or Y) by S in place.
    /// </summary>
    /// <param name="matrix">Z or Y values, row-major; S on return.</param>
    /// <param name="n">Number of ports.</param>
    /// <param name="admittance">True for Y, false for Z.</param>
    /// <param name="referenceOhm">Reference impedance of each port, ohm.</param>
    /// <param name="normalised">True when the values are already normalised (version 1 files); false for ohms or siemens.</param>
    /// <returns>False when (I + z) or (I + y) is singular, so no S exists; the matrix is then unchanged.</returns>
    public static bool ToScattering(Span<Complex> matrix, int n, bool admittance, ReadOnlySpan<double> referenceOhm, bool normalised)
    {
        if (n == 1)
        {
            Complex x = matrix[0];
            if (!normalised)
            {
                x = admittance ? x * referenceOhm[0] : x / referenceOhm[0];
            }
            Complex s = admittance ? (1 - x) / (1 + x) : (x - 1) / (x + 1);
            if (!IsFinite(s))
            {
                return false;
            }
            matrix[0] = s;
            return true;
        }

        Matrix<Complex> m = Matrix<Complex>.Build.Dense(n, n);
        for (int i = 0; i < n; i++)
        {
            for (int j = 0; j < n; j++)
            {
                Complex value = matrix[i * n + j];
                if (!normalised)
                {
                    double scale = Math.Sqrt(referenceOhm[i] * referenceOhm[j]);
                    value = admittance ? value * scale : value / scale;
                }
                m[i, j] = value;
            }
        }
        Matrix<Complex> identity = Matrix<Complex>.Build.DenseIdentity(n);
        Matrix<Complex> numerator = admittance ? identity - m : m - identity;
        Matrix<Complex> denominator = identity + m;
        // S·(I + x) = numerator, i.e. (I + x)ᵀ·Sᵀ = numeratorᵀ: one LU solve instead of an explicit inverse.
        Matrix<Complex> s2;
        try
        {
            s2 = denominator.Transpose().Solve(numerator.Transpose()).Transpose();
        }
        catch (ArgumentException)
        {
            return false;
        }
        for (int i = 0; i < n; i++)
        {
            for (int j = 0; j < n; j++)
            {
                if (!IsFinite(s2[i, j]))
                {
                    return false;
                }
            }
        }
        for (int i = 0; i < n; i++)
        {
            for (int j = 0; j < n; j++)
            {
                matrix[i * n + j] = s2[i, j];
            }
        }
        return true;
    }

    private static bool IsFinite(Complex c) => double.IsFinite(c.Real) && double.IsFinite(c.Imaginary);
}
