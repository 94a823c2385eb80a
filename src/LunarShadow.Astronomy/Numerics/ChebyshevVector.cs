using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Numerics;

/// <summary>
/// A vector-valued function on [a, b] fitted by three Chebyshev series (Numerical Recipes 2007, §5.8), evaluated with
/// one interleaved Clenshaw recurrence so the three components share the loop.
/// </summary>
public sealed class ChebyshevVector
{
    private readonly double[] _x, _y, _z;
    private readonly double _a, _b;

    /// <summary>Fits samples of a vector taken at <see cref="ChebyshevSeries.Nodes"/>(a, b, samples.Length).</summary>
    public ChebyshevVector(double a, double b, ReadOnlySpan<CartesianVector> samples)
    {
        _a = a;
        _b = b;
        var n = samples.Length;
        (_x, _y, _z) = (new double[n], new double[n], new double[n]);
        for (var j = 0; j < n; j++)
        {
            double sx = 0, sy = 0, sz = 0;
            for (var k = 0; k < n; k++)
            {
                var c = Math.Cos(Math.PI * j * (k + 0.5) / n);
                sx += samples[k].X * c;
                sy += samples[k].Y * c;
                sz += samples[k].Z * c;
            }
            (_x[j], _y[j], _z[j]) = (2.0 / n * sx, 2.0 / n * sy, 2.0 / n * sz);
        }
    }

    // Numerical Recipes (2007), eq. 5.8.11, for three series at once.
    /// <summary>The vector at x.</summary>
    public CartesianVector Value(double x)
    {
        var y = (2 * x - _a - _b) / (_b - _a);
        var y2 = 2 * y;
        double dx = 0, ddx = 0, dy = 0, ddy = 0, dz = 0, ddz = 0;
        ReadOnlySpan<double> cx = _x, cy = _y, cz = _z;
        for (var j = cx.Length - 1; j >= 1; j--)
        {
            (dx, ddx) = (y2 * dx - ddx + cx[j], dx);
            (dy, ddy) = (y2 * dy - ddy + cy[j], dy);
            (dz, ddz) = (y2 * dz - ddz + cz[j], dz);
        }
        return new CartesianVector(y * dx - ddx + 0.5 * cx[0], y * dy - ddy + 0.5 * cy[0], y * dz - ddz + 0.5 * cz[0]);
    }
}
