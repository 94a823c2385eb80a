namespace LunarShadow.Astronomy.Photography;

/// <summary>How much of the Moon's disc lies inside a circular shadow.</summary>
public static class DiscCoverage
{
    // Common practice (the lens-area formula for two intersecting circles, e.g. Weisstein, MathWorld "Circle-Circle
    // Intersection"): the overlap of circles of radii R and r at centre distance d, as a fraction of the smaller's area.
    /// <summary>Fraction of the Moon's disc (radius r) inside a shadow circle (radius R) at centre distance d.</summary>
    public static double FractionInside(double shadowRadius, double moonRadius, double distance)
    {
        var (big, small, d) = (Math.Max(shadowRadius, 0), moonRadius, distance);
        if (big <= 0) return 0;
        if (d >= big + small) return 0;
        if (d <= big - small) return 1;
        if (d <= small - big) return big * big / (small * small);
        var a = small * small * Math.Acos(Math.Clamp((d * d + small * small - big * big) / (2 * d * small), -1, 1));
        var b = big * big * Math.Acos(Math.Clamp((d * d + big * big - small * small) / (2 * d * big), -1, 1));
        var c = 0.5 * Math.Sqrt(Math.Max(0, (-d + small + big) * (d + small - big) * (d - small + big) * (d + small + big)));
        return (a + b - c) / (Math.PI * small * small);
    }
}
