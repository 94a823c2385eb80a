using LunarShadow.Astronomy.Embedded;
using LunarShadow.Astronomy.Ephemeris;
using LunarShadow.Astronomy.Tests.Support;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Astronomy.Tests.Ephemeris;

public class EmbeddedDataTests
{
    [Theory]
    [InlineData(EmbeddedDataSet.LunarTruncated, "src/LunarShadow.Astronomy/Ephemeris/Data/SHA256SUMS", "elpmpp02-de405-truncated.bin")]
    [InlineData(EmbeddedDataSet.LunarFull, "src/LunarShadow.Astronomy/Ephemeris/Data/SHA256SUMS", "elpmpp02-de405-full.bin")]
    [InlineData(EmbeddedDataSet.EarthVsop87B, "src/LunarShadow.Astronomy/Ephemeris/Data/SHA256SUMS", "vsop87b-earth.bin")]
    [InlineData(EmbeddedDataSet.MeasuredDeltaT, "src/LunarShadow.Astronomy/Time/Data/SHA256SUMS", "deltat-measured.bin")]
    public void Embedded_tables_match_the_checksums_the_import_tool_wrote(string resource, string sumsFile, string fileName)
    {
        var expected = File.ReadAllLines(RepositoryFiles.PathOf(sumsFile))
            .Select(line => line.Split("  "))
            .Single(parts => parts[1] == fileName)[0];
        Assert.Equal(expected, EmbeddedDataSet.Sha256(resource));
    }

    // Term counts of the tables in astronomia@4.2.0 data/elpMppDe.js, elpMppDeFull.js and vsop87Bearth.js.
    [Fact]
    public void Embedded_series_hold_every_term_of_the_package()
    {
        Assert.Equal(1386 + 592 + 210 + 2 + 785 + 235 + 46 + 1066 + 424 + 114 + 2, LunarTheory.Truncated.TermCount);
        Assert.Equal(12337 + 1199 + 219 + 2 + 7380 + 516 + 52 + 12819 + 1165 + 210 + 2, LunarTheory.Full.TermCount);
        Assert.Equal(623 + 379 + 144 + 23 + 11 + 4 + 184 + 134 + 62 + 14 + 6 + 2 + 523 + 290 + 134 + 20 + 9 + 2, EarthOrbitTheory.Vsop87B.TermCount);
    }

    // astronomia@4.2.0's own evaluation (elp.Moon#positionXYZ, planetposition.Planet#position2000), printed by
    // tools/ephemeris-import/spot-values.mjs: J2000 ecliptic rectangular Moon (km) and heliocentric Earth L, B, R.
    [Theory]
    [InlineData(2448724.5, -252118.7345139895, 267821.38745367894, -20748.122168151855, 3.533397054767555, -0.000005046804344148678, 1.0024976959452216)]
    [InlineData(2451545.0, -291608.3326948894, -274979.7847834426, 36271.176861716005, 1.7519238636718308, -0.00000396557157216273, 0.9833276823222942)]
    [InlineData(2460748.7902, -399000.5997230048, 44701.54137294238, 2221.873766947839, 3.029841630742659, -6.66952400590306e-7, 0.9941946967678243)]
    [InlineData(1625000.5, 37589.53704102352, 381322.60847134213, 35724.917113058895, 2.301182937618968, 0.003915528634084743, 0.9856558363869112)]
    [InlineData(2816000.5, 345709.4416970841, 99326.25612523084, 26083.119728174865, 0.5117426438756496, -0.001356429771155636, 0.9960371553862593)]
    public void Series_reproduce_the_package_own_numbers(double jde, double x, double y, double z, double l, double b, double r)
    {
        var tt = TtInstant.FromJulianDate(jde);
        var moon = LunarTheory.Truncated.GeocentricState(tt).PositionKm;
        Assert.Equal(x, moon.X, 1e-3);
        Assert.Equal(y, moon.Y, 1e-3);
        Assert.Equal(z, moon.Z, 1e-3);
        var earth = EarthOrbitTheory.Vsop87B.HeliocentricSpherical(tt);
        Assert.Equal(l, Math.IEEERemainder(earth.L - l, 2 * Math.PI) + l, 1e-10);
        Assert.Equal(b, earth.B, 1e-10);
        Assert.Equal(r, earth.R, 1e-10);
    }

    // Chapront & Francou (2003) via the package: the truncated series stays within 0.1″ of the full one.
    [Theory]
    [InlineData(990000.5)]
    [InlineData(1625000.5)]
    [InlineData(2415020.5)]
    [InlineData(2451545.0)]
    [InlineData(2460748.7902)]
    [InlineData(2816000.5)]
    [InlineData(2817000.5)]
    public void Truncated_lunar_series_stays_within_a_tenth_of_an_arcsecond_of_the_full_one(double jde)
    {
        var tt = TtInstant.FromJulianDate(jde);
        var truncated = LunarTheory.Truncated.GeocentricState(tt).PositionKm;
        var full = LunarTheory.Full.GeocentricState(tt).PositionKm;
        var angleArcseconds = Math.Atan2(truncated.Cross(full).Length, truncated.Dot(full)) * 206264.806;
        Assert.True(angleArcseconds < 0.1, $"{angleArcseconds:F4}″");
        Assert.True(Math.Abs(truncated.Length - full.Length) < 0.2, "distance within 200 m");
    }

    [Fact]
    public void Velocities_agree_with_differenced_positions()
    {
        var tt = TtInstant.FromJulianDate(2460748.7902);
        const double h = 1e-3; // days
        foreach (var state in new Func<TtInstant, EclipticState>[] { LunarTheory.Truncated.GeocentricState, EarthOrbitTheory.Vsop87B.GeocentricSun })
        {
            var differenced = (state(tt.PlusSeconds(h * 86400)).PositionKm - state(tt.PlusSeconds(-h * 86400)).PositionKm) / (2 * h);
            var analytic = state(tt).VelocityKmPerDay;
            Assert.True((differenced - analytic).Length < 1e-4 * analytic.Length, $"{(differenced - analytic).Length} km/day");
        }
    }
}
