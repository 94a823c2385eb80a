namespace LunarShadow.Astronomy.Eclipses;

/// <summary>
/// The Saros series of a full Moon, from its lunation number alone. Two eclipses one Saros apart (223 lunations) share a
/// series; one inex apart (358 lunations) their series numbers differ by one (van den Bergh 1955, Periodicity and
/// Variation of Solar (and Lunar) Eclipses). Since 223 and 358 are coprime, a lunation offset splits into Saros and
/// inex steps in a one-parameter family of ways; the Moon's argument of latitude picks the one way in which the
/// eclipse lies in the narrow band of the Saros–inex panorama where eclipses occur.
/// </summary>
public static class SarosNumbering
{
    // Five Millennium Canon of Lunar Eclipses (Espenak & Meeus 2009): the eclipse of 2000 January 21 (lunation 0) is in Saros 124.
    private const long ReferenceLunation = 0;
    private const int ReferenceSeries = 124;

    // Meeus (1998), ch. 49: F advances 390.67050284° per lunation. Reduced modulo 180° (eclipses occur at either node):
    // per inex 358·φ − 777·180° ≈ +0.040°, per Saros 223·φ − 484·180° ≈ −0.478°.
    private const double DegreesPerLunation = 390.67050284;
    private const double InexDrift = 358 * DegreesPerLunation - 777 * 180.0;
    private const double SarosDrift = 223 * DegreesPerLunation - 484 * 180.0;
    private const double FamilyStep = 223 * InexDrift - 358 * SarosDrift; // = 180° exactly in exact arithmetic

    private static readonly long InverseOfInexModSaros = ModularInverse(358 % 223, 223);

    /// <summary>The Saros series of the full Moon of lunation k (meaningful when that full Moon is eclipsed).</summary>
    public static int SeriesOf(long k)
    {
        var offset = k - ReferenceLunation;
        var inexSteps = Mod(Mod(offset, 223) * InverseOfInexModSaros, 223);
        var sarosSteps = (offset - 358 * inexSteps) / 223;
        var observed = NodeDistance(k) - NodeDistance(ReferenceLunation);
        var predicted = InexDrift * inexSteps + SarosDrift * sarosSteps;
        var m = (long)Math.Round((observed - predicted) / FamilyStep);
        return (int)(ReferenceSeries + inexSteps + 223 * m);
    }

    /// <summary>F reduced to the nearest node, degrees in (−90, 90].</summary>
    private static double NodeDistance(long k)
    {
        var f = MeanLunation.ArgumentOfLatitudeDegrees(k) % 180.0;
        if (f < 0) f += 180;
        return f > 90 ? f - 180 : f;
    }

    private static long Mod(long a, long m) => ((a % m) + m) % m;

    private static long ModularInverse(long a, long m)
    {
        for (long x = 1; x < m; x++)
            if (a * x % m == 1) return x;
        throw new InvalidOperationException("No inverse.");
    }
}
