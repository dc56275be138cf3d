using System;
using MathNet.Numerics.LinearAlgebra;
using Phaseward.Electrical;

namespace Phaseward.Tests.Reference;

/// <summary>
/// The exact unit-step response of an RC tree, independent of Phaseward's estimates: nodal analysis
/// C·dv/dt = −G·v + b·u(t) solved by eigen-decomposition with MathNet.Numerics (a general-purpose numerics library),
/// and the 50 % crossing found by bisection.
/// </summary>
/// <remarks>
/// With e = v − 1 (the steady state is 1 V at every node of an RC tree), C·de/dt = −G·e, e(0) = −1. Substituting
/// w = C^½·e gives dw/dt = −S·w with S = C^−½·G·C^−½ symmetric positive definite; S = Q·Λ·Qᵀ, so
/// v(t) = 1 − C^−½·Q·exp(−Λt)·Qᵀ·C^½·1. Units inside: kΩ, fF and ps (kΩ·fF = 1 ps), to keep the matrix well scaled.
/// </remarks>
internal sealed class ExactStepResponse
{
    private readonly Matrix<double> left;    // C^-1/2 · Q
    private readonly Vector<double> right;   // Qᵀ · C^1/2 · 1
    private readonly Vector<double> rates;   // eigenvalues (1/ps)

    /// <param name="parent">Each node's parent (−1: hangs from the source).</param>
    /// <param name="ohms">The resistance between each node and its parent (or the source).</param>
    /// <param name="farads">Each node's capacitance to ground.</param>
    public ExactStepResponse(int[] parent, double[] ohms, double[] farads)
    {
        var n = parent.Length;
        var g = Matrix<double>.Build.Dense(n, n);
        for (var i = 0; i < n; i++)
        {
            var conductance = 1.0 / (ohms[i] / 1e3);
            g[i, i] += conductance;
            var p = parent[i];
            if (p < 0) continue;
            g[p, p] += conductance;
            g[i, p] -= conductance;
            g[p, i] -= conductance;
        }

        var rootC = Vector<double>.Build.Dense(n, i => Math.Sqrt(farads[i] / 1e-15));
        var s = Matrix<double>.Build.Dense(n, n, (i, j) => g[i, j] / (rootC[i] * rootC[j]));
        var evd = s.Evd(Symmetricity.Symmetric);
        var q = evd.EigenVectors;
        rates = Vector<double>.Build.Dense(n, k => evd.EigenValues[k].Real);
        left = Matrix<double>.Build.Dense(n, n, (i, k) => q[i, k] / rootC[i]);
        right = q.TransposeThisAndMultiply(rootC);
    }

    /// <summary>The node's voltage (V) at time t after a 1 V step.</summary>
    public double Voltage(int node, double seconds)
    {
        var ps = seconds * 1e12;
        var sum = 0.0;
        for (var k = 0; k < rates.Count; k++)
            sum += left[node, k] * Math.Exp(-rates[k] * ps) * right[k];
        return 1.0 - sum;
    }

    /// <summary>When the node first reaches 0.5 V (bisection to 1e-12 relative; the step response of an RC tree rises monotonically).</summary>
    public double FiftyPercentTime(int node)
    {
        var high = 1e-12;
        while (Voltage(node, high) < 0.5)
            high *= 2;
        var low = 0.0;
        while (high - low > 1e-12 * high)
        {
            var middle = (low + high) / 2;
            if (Voltage(node, middle) < 0.5) low = middle;
            else high = middle;
        }

        return (low + high) / 2;
    }

    public static ExactStepResponse UniformLadder(int sections, double ohms, double farads)
    {
        var parent = new int[sections];
        for (var i = 0; i < sections; i++) parent[i] = i - 1;
        var r = new double[sections];
        var c = new double[sections];
        for (var i = 0; i < sections; i++) { r[i] = ohms; c[i] = farads; }
        return new ExactStepResponse(parent, r, c);
    }

    public static ExactStepResponse Of(RcTree tree)
    {
        var n = tree.Count;
        var parent = new int[n];
        var r = new double[n];
        var c = new double[n];
        for (var i = 0; i < n; i++)
        {
            parent[i] = tree.ParentOf(i);
            r[i] = tree.ResistanceOf(i).Ohms;
            c[i] = tree.CapacitanceOf(i).Farads;
        }

        return new ExactStepResponse(parent, r, c);
    }
}
