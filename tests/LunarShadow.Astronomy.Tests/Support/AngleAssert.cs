using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Tests.Support;

internal static class AngleAssert
{
    /// <summary>Asserts two directions agree within a tolerance in arc-seconds, wrapping at 360°.</summary>
    public static void Near(double expectedDegrees, Angle actual, double toleranceArcseconds)
    {
        var difference = (actual - Angle.FromDegrees(expectedDegrees)).NormalizedSigned().Arcseconds;
        Assert.True(Math.Abs(difference) <= toleranceArcseconds,
            FormattableString.Invariant($"expected {expectedDegrees:0.000000}°, got {actual.Degrees:0.000000}° ({difference:+0.000;-0.000}″, tolerance {toleranceArcseconds}″)"));
    }
}
