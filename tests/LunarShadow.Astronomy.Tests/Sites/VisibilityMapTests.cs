using LunarShadow.Astronomy.Sites;
using LunarShadow.Astronomy.Tests.Eclipses;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Astronomy.Tests.Sites;

public class VisibilityMapTests
{
    private static bool Inside(VisibilityRegion region, double lat, double lon) =>
        region.Boxes.Any(b => lat >= b.South && lat < b.North && lon >= b.West && lon < b.East);

    // The map must agree with the site computation (which uses the ellipsoid and Sæmundsson's refraction) wherever a site
    // is more than a couple of cells from the region's edge.
    [Fact]
    public void The_map_agrees_with_local_circumstances_away_from_its_edges()
    {
        var eclipse = EclipseOnDate.Find(2025, 3, 14);
        var time = TimeScaleConverter.Default;
        var regions = VisibilityMap.Compute(eclipse, time.DeltaTAt(eclipse.GreatestEclipse).Seconds).ToDictionary(r => r.Name);
        var random = new Random(14);
        var compared = 0;
        for (var i = 0; i < 400; i++)
        {
            var lat = Math.Floor(random.NextDouble() * 170 - 85) + 0.5;
            var lon = Math.Floor(random.NextDouble() * 360 - 180) + 0.5;
            var near = new[] { (2.0, 0.0), (-2.0, 0.0), (0.0, 2.0), (0.0, -2.0) }
                .Any(d => Inside(regions["P1"], lat + d.Item1, Wrap(lon + d.Item2)) != Inside(regions["P1"], lat, lon));
            if (near) continue;
            var local = LocalCircumstancesCalculator.Compute(eclipse, Site.At(lat, lon), time);
            Assert.Equal(local.Contacts.Single(c => c.Label == "P1").Visible, Inside(regions["P1"], lat, lon));
            compared++;
        }
        Assert.True(compared > 300);
    }

    // NASA eclipse predictions (F. Espenak), 2025 March 14 (from memory): the whole eclipse is visible from the Americas;
    // western Europe sees the start before moonset; eastern Australia sees the end after moonrise.
    [Fact]
    public void The_2025_March_14_map_matches_the_published_visibility()
    {
        var eclipse = EclipseOnDate.Find(2025, 3, 14);
        var regions = VisibilityMap.Compute(eclipse, 69).ToDictionary(r => r.Name);
        Assert.True(Inside(regions["whole-eclipse"], 40.7, -74.0));
        Assert.True(Inside(regions["whole-totality"], -23.5, -46.6));
        Assert.True(Inside(regions["P1"], 51.5, -0.1) && !Inside(regions["P4"], 51.5, -0.1));
        Assert.True(!Inside(regions["P1"], -33.9, 151.2) && Inside(regions["P4"], -33.9, 151.2));
        Assert.All(regions.Values, r => Assert.All(r.Boxes, b => Assert.True(b.West < b.East && b.South < b.North)));
    }

    private static double Wrap(double lon) => lon >= 180 ? lon - 360 : lon < -180 ? lon + 360 : lon;
}
