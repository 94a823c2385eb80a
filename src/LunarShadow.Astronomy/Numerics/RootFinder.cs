namespace LunarShadow.Astronomy.Numerics;

/// <summary>Roots and minima of smooth functions of one variable.</summary>
public static class RootFinder
{
    // Brent (1973), Algorithms for Minimization without Derivatives, ch. 4 (zeroin): bisection safeguarded by
    // secant and inverse quadratic interpolation.
    /// <summary>A root of f in [a, b], where f(a) and f(b) differ in sign, to within <paramref name="tolerance"/>.</summary>
    public static double Brent(Func<double, double> f, double a, double b, double tolerance)
    {
        double fa = f(a), fb = f(b);
        if (fa == 0) return a;
        if (fb == 0) return b;
        if (Math.Sign(fa) == Math.Sign(fb)) throw new ArgumentException("The interval does not bracket a root.");
        double c = a, fc = fa, d = b - a, e = d;
        for (var iteration = 0; iteration < 200; iteration++)
        {
            if (Math.Sign(fb) == Math.Sign(fc))
            {
                c = a;
                fc = fa;
                d = e = b - a;
            }
            if (Math.Abs(fc) < Math.Abs(fb))
            {
                (a, b, c) = (b, c, b);
                (fa, fb, fc) = (fb, fc, fb);
            }
            var tol = 2 * double.Epsilon + 0.5 * tolerance;
            var m = 0.5 * (c - b);
            if (Math.Abs(m) <= tol || fb == 0) return b;
            if (Math.Abs(e) >= tol && Math.Abs(fa) > Math.Abs(fb))
            {
                double p, q, s = fb / fa;
                if (a == c)
                {
                    p = 2 * m * s;
                    q = 1 - s;
                }
                else
                {
                    var r = fb / fc;
                    q = fa / fc;
                    p = s * (2 * m * q * (q - r) - (b - a) * (r - 1));
                    q = (q - 1) * (r - 1) * (s - 1);
                }
                if (p > 0) q = -q;
                else p = -p;
                if (2 * p < Math.Min(3 * m * q - Math.Abs(tol * q), Math.Abs(e * q)))
                {
                    e = d;
                    d = p / q;
                }
                else
                {
                    d = m;
                    e = m;
                }
            }
            else
            {
                d = m;
                e = m;
            }
            a = b;
            fa = fb;
            b += Math.Abs(d) > tol ? d : (m > 0 ? tol : -tol);
            fb = f(b);
        }
        return b;
    }

    /// <summary>
    /// The first sign change of f scanning from <paramref name="from"/> towards <paramref name="to"/> in
    /// <paramref name="steps"/> steps, refined to a root; null when f keeps one sign.
    /// </summary>
    public static double? FirstCrossing(Func<double, double> f, double from, double to, int steps, double tolerance)
    {
        var previousX = from;
        var previous = f(from);
        for (var i = 1; i <= steps; i++)
        {
            var x = from + (to - from) * i / steps;
            var value = f(x);
            if (Math.Sign(value) != Math.Sign(previous) || value == 0)
                return Brent(f, previousX, x, tolerance);
            previousX = x;
            previous = value;
        }
        return null;
    }

    // Kiefer (1953), golden-section search: the interval shrinks by 0.618 each step, keeping the least value bracketed.
    /// <summary>The abscissa of the least value of a unimodal f in [a, b], to within <paramref name="tolerance"/>.</summary>
    public static double Minimum(Func<double, double> f, double a, double b, double tolerance)
    {
        var ratio = (Math.Sqrt(5) - 1) / 2;
        var c = b - ratio * (b - a);
        var d = a + ratio * (b - a);
        double fc = f(c), fd = f(d);
        for (var iteration = 0; iteration < 200 && Math.Abs(b - a) > tolerance; iteration++)
        {
            if (fc < fd)
            {
                (b, d, fd) = (d, c, fc);
                c = b - ratio * (b - a);
                fc = f(c);
            }
            else
            {
                (a, c, fc) = (c, d, fd);
                d = a + ratio * (b - a);
                fd = f(d);
            }
        }
        return (a + b) / 2;
    }
}
