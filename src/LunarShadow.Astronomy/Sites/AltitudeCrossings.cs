using LunarShadow.Astronomy.Numerics;

namespace LunarShadow.Astronomy.Sites;

/// <summary>
/// Where the Moon's upper limb crosses a horizon during the eclipse night. The limb is sampled every 30 minutes once;
/// each horizon (the sea horizon, the local profile, the visibility threshold) is a function of the limb's altitude
/// and azimuth, so all share the samples. Sign changes are refined by Brent's method to a tenth of a second. A limb that
/// touches a smooth horizon and goes back within one interval must turn there; near a turning point the altitude
/// curves by at most about 3.9°/h² (the Earth's rotation, 15°/h, squared, in radians), so within 30 minutes it stays
/// within 0.5° of the horizon at both ends: wherever the difference is under 2° at an end, a parabola through the
/// middle finds the turning point and checks it. Near a horizon-profile point that stands within 2° of the limb the
/// interval is searched in ten parts instead, since a profile may rise steeply.
/// </summary>
internal sealed class AltitudeCrossings
{
    private const double StepHours = 0.5;
    private const double CloseRadians = 2 * Math.PI / 180;
    private const double ToleranceHours = 0.1 / 3600;

    private readonly Func<double, (double Limb, double Azimuth)> _sample;
    private readonly double _from;
    private readonly double[] _hours;
    private readonly (double Limb, double Azimuth)[] _samples;

    /// <summary>Samples the Moon's limb over [from, to] (hours).</summary>
    public AltitudeCrossings(LocalSky sky, double from, double to)
        : this(sky.MoonLimbAt, from, to)
    {
    }

    /// <summary>Samples any body's altitude and azimuth (radians) over [from, to] (hours).</summary>
    public AltitudeCrossings(Func<double, (double Limb, double Azimuth)> sample, double from, double to)
    {
        _sample = sample;
        _from = from;
        var count = (int)Math.Ceiling((to - from) / StepHours) + 1;
        _hours = new double[count];
        _samples = new (double, double)[count];
        for (var i = 0; i < count; i++)
        {
            _hours[i] = Math.Min(to, from + i * StepHours);
            _samples[i] = sample(_hours[i]);
        }
    }

    /// <summary>
    /// Sign changes of horizonDifference(limb altitude, azimuth): the hour and whether it goes from negative to positive.
    /// </summary>
    public List<(double Hours, bool Rising)> Find(Func<double, double, double> difference, HorizonProfile profile)
    {
        double F(double h)
        {
            var (limb, azimuth) = _sample(h);
            return difference(limb, azimuth);
        }
        var crossings = new List<(double, bool)>();
        for (var i = 1; i < _hours.Length; i++)
        {
            var (x0, x1) = (_hours[i - 1], _hours[i]);
            var f0 = difference(_samples[i - 1].Limb, _samples[i - 1].Azimuth);
            var f1 = difference(_samples[i].Limb, _samples[i].Azimuth);
            if (ProfileStandsClose(profile, _samples[i - 1], _samples[i])) Subdivide(F, x0, f0, x1, f1, crossings);
            else if (Math.Sign(f0) != Math.Sign(f1)) crossings.Add((RootFinder.Brent(F, x0, x1, ToleranceHours), f1 > f0));
            else if (Math.Abs(f0) < CloseRadians || Math.Abs(f1) < CloseRadians) ProbeForGraze(F, x0, f0, x1, f1, crossings);
        }
        return crossings;
    }

    /// <summary>The value of a horizon difference at the first sample (the start of the interval).</summary>
    public double AtStart(Func<double, double, double> difference) => difference(_samples[0].Limb, _samples[0].Azimuth);

    /// <summary>The stretches where the difference is ≥ 0, given its crossings.</summary>
    public List<(double Start, double End)> PositiveSpans(Func<double, double, double> difference, List<(double Hours, bool Rising)> crossings)
    {
        var spans = new List<(double, double)>();
        double? start = AtStart(difference) >= 0 ? _from : null;
        foreach (var (hours, rising) in crossings)
        {
            if (rising && start is null) start = hours;
            else if (!rising && start is { } s)
            {
                spans.Add((s, hours));
                start = null;
            }
        }
        if (start is { } open) spans.Add((open, _hours[^1]));
        return spans;
    }

    private static bool ProfileStandsClose(HorizonProfile profile, (double Limb, double Azimuth) a, (double Limb, double Azimuth) b)
    {
        if (profile.IsFlat) return false;
        var lowest = Math.Min(a.Limb, b.Limb) * 180 / Math.PI - 2;
        var (from, to) = (Deg(a.Azimuth), Deg(b.Azimuth));
        var span = ((to - from) % 360 + 360) % 360;
        if (span > 180) (from, span) = (to, 360 - span);
        foreach (var (azimuth, altitude) in profile.Points)
        {
            var along = ((azimuth - from) % 360 + 360) % 360;
            if (along <= span && altitude >= lowest) return true;
        }
        return false;

        static double Deg(double radians) => ((radians * 180 / Math.PI) % 360 + 360) % 360;
    }

    // A smooth altitude has at most one turning point in 15 minutes: a parabola through the ends and the middle locates
    // it, and a sign change there means the limb touched the horizon and went back (or the reverse).
    private static void ProbeForGraze(Func<double, double> f, double x0, double f0, double x1, double f1, List<(double, bool)> crossings)
    {
        var xm = 0.5 * (x0 + x1);
        var fm = f(xm);
        var half = 0.5 * (x1 - x0);
        var curvature = f1 - 2 * fm + f0;
        var turning = curvature == 0 ? xm : Math.Clamp(xm - half * (f1 - f0) / (2 * curvature), x0, x1);
        var ft = turning == xm ? fm : f(turning);
        if (Math.Sign(ft) == Math.Sign(f0) || ft == 0) return;
        crossings.Add((RootFinder.Brent(f, x0, turning, ToleranceHours), ft > f0));
        crossings.Add((RootFinder.Brent(f, turning, x1, ToleranceHours), f1 > ft));
    }

    private static void Subdivide(Func<double, double> f, double x0, double f0, double x1, double f1, List<(double, bool)> crossings)
    {
        const int parts = 10;
        var (a, fa) = (x0, f0);
        for (var j = 1; j <= parts; j++)
        {
            var b = j == parts ? x1 : x0 + (x1 - x0) * j / parts;
            var fb = j == parts ? f1 : f(b);
            if (Math.Sign(fa) != Math.Sign(fb) && fb != 0) crossings.Add((RootFinder.Brent(f, a, b, ToleranceHours), fb > fa));
            (a, fa) = (b, fb);
        }
    }
}
