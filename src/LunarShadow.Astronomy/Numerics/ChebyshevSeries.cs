namespace LunarShadow.Astronomy.Numerics;

/// <summary>
/// A function on [a, b] approximated by a Chebyshev series fitted at the Chebyshev nodes of the first kind
/// (Press et al., Numerical Recipes 3rd ed. 2007, §5.8), with its derivative.
/// </summary>
public sealed class ChebyshevSeries
{
    private readonly double[] _c;
    private readonly double[] _derivative;
    private readonly double _a, _b;

    private ChebyshevSeries(double a, double b, double[] coefficients)
    {
        _a = a;
        _b = b;
        _c = coefficients;
        _derivative = DerivativeCoefficients(coefficients, b - a);
    }

    /// <summary>The nodes at which to sample a function for a fit of the given number of coefficients.</summary>
    public static double[] Nodes(double a, double b, int count)
    {
        var nodes = new double[count];
        for (var k = 0; k < count; k++)
            nodes[k] = 0.5 * (b + a) + 0.5 * (b - a) * Math.Cos(Math.PI * (k + 0.5) / count);
        return nodes;
    }

    // Numerical Recipes (2007), eq. 5.8.7: c_j = (2/N) Σ_k f(x_k) cos(π j (k + ½)/N).
    /// <summary>Fits samples taken at <see cref="Nodes"/>(a, b, samples.Length).</summary>
    public static ChebyshevSeries Fit(double a, double b, ReadOnlySpan<double> samples)
    {
        var n = samples.Length;
        var c = new double[n];
        for (var j = 0; j < n; j++)
        {
            var sum = 0.0;
            for (var k = 0; k < n; k++) sum += samples[k] * Math.Cos(Math.PI * j * (k + 0.5) / n);
            c[j] = 2.0 / n * sum;
        }
        return new ChebyshevSeries(a, b, c);
    }

    /// <summary>Start of the interval.</summary>
    public double Start => _a;

    /// <summary>End of the interval.</summary>
    public double End => _b;

    /// <summary>The value at x.</summary>
    public double Value(double x) => Clenshaw(_c, x);

    /// <summary>The derivative at x.</summary>
    public double Derivative(double x) => Clenshaw(_derivative, x);

    // Numerical Recipes (2007), eq. 5.8.11: Clenshaw's recurrence, with the c₀/2 convention.
    private double Clenshaw(double[] c, double x)
    {
        var y = (2 * x - _a - _b) / (_b - _a);
        var y2 = 2 * y;
        double d = 0, dd = 0;
        for (var j = c.Length - 1; j >= 1; j--)
        {
            var sv = d;
            d = y2 * d - dd + c[j];
            dd = sv;
        }
        return y * d - dd + 0.5 * c[0];
    }

    // Numerical Recipes (2007), §5.9 (chder): coefficients of the derivative.
    private static double[] DerivativeCoefficients(double[] c, double width)
    {
        var n = c.Length;
        var d = new double[n];
        if (n < 2) return d;
        d[n - 1] = 0;
        d[n - 2] = 2 * (n - 1) * c[n - 1];
        for (var j = n - 3; j >= 0; j--) d[j] = d[j + 2] + 2 * (j + 1) * c[j + 1];
        var scale = 2.0 / width;
        for (var j = 0; j < n; j++) d[j] *= scale;
        return d;
    }
}
