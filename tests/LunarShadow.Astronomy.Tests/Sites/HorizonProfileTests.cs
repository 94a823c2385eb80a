using LunarShadow.Astronomy.Sites;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Tests.Sites;

public class HorizonProfileTests
{
    // Common practice: a horizon profile is interpolated linearly in azimuth between neighbouring points, wrapping
    // through north. The reference here is that rule written out directly (scan every segment), checked against the
    // profile's binary-search lookup for profiles of 2 to 360 random points at 2,000 azimuths each.
    [Fact]
    public void The_lookup_interpolates_between_the_neighbouring_points_for_every_azimuth_and_profile_size()
    {
        var random = new Random(10);
        foreach (var count in new[] { 2, 3, 7, 60, 359, 360 })
        {
            var points = Enumerable.Range(0, count).Select(_ => (Math.Round(random.NextDouble() * 360, 3), random.NextDouble() * 20 - 5)).ToList();
            var profile = new HorizonProfile(points);
            var sorted = profile.Points;
            for (var k = 0; k < 2000; k++)
            {
                var az = k < 10 ? sorted[k % sorted.Count].Azimuth : random.NextDouble() * 360;
                Assert.Equal(Reference(sorted, az), profile.AltitudeAt(Angle.FromDegrees(az)).Degrees, 9);
            }
        }
    }

    private static double Reference(IReadOnlyList<(double Azimuth, double Altitude)> sorted, double az)
    {
        for (var i = 0; i < sorted.Count; i++)
        {
            var (a0, h0) = sorted[i];
            var (a1, h1) = sorted[(i + 1) % sorted.Count];
            var span = ((a1 - a0) % 360 + 360) % 360;
            var along = ((az - a0) % 360 + 360) % 360;
            if (span > 0 && along < span) return h0 + (h1 - h0) * along / span;
        }
        return sorted[0].Altitude;
    }
}
