using LunarShadow.Astronomy.Photography;

namespace LunarShadow.Astronomy.Tests.Photography;

// Settings a camera offers. Markings are common practice (the third-stop shutter times printed on camera dials and in
// menus, 1/8000 to 30 s, each standing for 2^(k/3) s) and ISO 12232's arithmetic speed series (25, 32, 40, 50, 64, 80,
// 100, 125, 160 … 409600), both from memory.
public class SettableExposureTests
{
    private static readonly Camera FullFrame = new(36, 24, 4.3, 400, 1, Mount.FixedTripod, 100, 11);

    private static Exposure Computed(double shutter, double iso, params double[] bracket) =>
        new(shutter, iso, 11, 10, bracket.Length == 0 ? [shutter] : bracket, []);

    [Fact]
    public void The_full_moon_at_f11_ISO_100_is_set_as_one_160th()
    {
        // docs/accuracy.md: the computed full-Moon exposure at f/11, ISO 100 is 1/163 s.
        var settable = SettableExposure.For(Computed(1.0 / 163, 100), FullFrame);
        Assert.Equal("1/160 s", settable.ShutterLabel);
        Assert.Equal(100, settable.Iso);
        Assert.Equal(Math.Pow(2, -22 / 3.0), settable.ShutterSeconds, 12);
        Assert.InRange(settable.OffStops, 0, 1 / 6.0);
    }

    [Theory]
    [InlineData(431, 400)]
    [InlineData(1000, 1000)]
    [InlineData(1150, 1250)] // 1250 stands for 100·2^(11/3) ≈ 1270
    [InlineData(6000, 6400)]
    [InlineData(25600, 25600)]
    [InlineData(20, 25)] // below the series: its first marking
    public void An_ISO_the_plan_computed_goes_to_the_nearest_third_stop(double computed, double marked)
    {
        var settable = SettableExposure.For(Computed(1.0 / 60, computed), FullFrame);
        Assert.Equal(marked, settable.Iso);
    }

    [Theory]
    [InlineData(1.0 / 8000, "1/8000 s")]
    [InlineData(1.0 / 64, "1/60 s")]
    [InlineData(1.0 / 16, "1/15 s")]
    [InlineData(0.3, "0.3 s")]
    [InlineData(2.4, "2.5 s")]
    [InlineData(10.2, "10 s")]
    [InlineData(30, "30 s")]
    public void A_computed_shutter_goes_to_the_marked_time_nearest_it(double seconds, string label) =>
        Assert.Equal(label, SettableExposure.For(Computed(seconds, 100), FullFrame with { SlowestShutterSeconds = 3600 }).ShutterLabel);

    [Fact]
    public void Beyond_thirty_seconds_the_shutter_is_timed_on_bulb_in_whole_seconds()
    {
        var settable = SettableExposure.For(Computed(47.3, 1600), FullFrame with { SlowestShutterSeconds = 3600 });
        Assert.Equal("47 s bulb", settable.ShutterLabel);
        Assert.Equal(47, settable.ShutterSeconds);
    }

    [Fact]
    public void The_ISO_rounding_is_taken_up_by_the_shutter_not_lost()
    {
        // ISO 431 becomes 400 (0.108 stop less), so 1/100 s becomes about 1/93 s and is set as 1/100 or 1/80.
        var settable = SettableExposure.For(Computed(1.0 / 100, 431), FullFrame);
        Assert.Equal(400, settable.Iso);
        Assert.InRange(Math.Abs(settable.OffStops), 0, 1 / 6.0 + 1e-9);
    }

    [Fact]
    public void A_fixed_shutter_is_kept_and_only_the_ISO_is_rounded()
    {
        var camera = FullFrame with { ShutterSeconds = 1.0 / 250 };
        var settable = SettableExposure.For(Computed(1.0 / 250, 2900), camera);
        Assert.Equal("1/250 s", settable.ShutterLabel);
        Assert.Equal(3200, settable.Iso);
        Assert.Equal(Math.Log2(3200.0 / 2900), settable.OffStops, 12); // ISO 3200 is 100·2^5 exactly
    }

    [Fact]
    public void Settings_stay_within_the_cameras_shutter_range()
    {
        var camera = FullFrame with { FastestShutterSeconds = 1.0 / 4000, SlowestShutterSeconds = 30 };
        Assert.Equal("1/4000 s", SettableExposure.For(Computed(1.0 / 4000, 100), camera).ShutterLabel);
        Assert.Equal("30 s", SettableExposure.For(Computed(30, 100), camera).ShutterLabel);
    }

    [Fact]
    public void The_bracket_is_set_one_marking_per_computed_shutter()
    {
        var settable = SettableExposure.For(Computed(1.0 / 125, 400, 1.0 / 500, 1.0 / 250, 1.0 / 125, 1.0 / 62.5, 1.0 / 31.25), FullFrame);
        Assert.Equal(["1/500 s", "1/250 s", "1/125 s", "1/60 s", "1/30 s"], settable.BracketLabels);
    }

    // Walks the whole settable range: every computed exposure inside the camera's limits is set within a sixth of a stop.
    [Fact]
    public void Every_exposure_within_the_cameras_range_is_set_within_a_sixth_of_a_stop()
    {
        var random = new Random(20261202);
        for (var i = 0; i < 20_000; i++)
        {
            var iso = 100 * Math.Pow(2, random.NextDouble() * 8); // ISO 100–25600
            var shutter = Math.Pow(2, -13 + random.NextDouble() * 17.9); // 1/8192 s to about 30 s
            shutter = Math.Clamp(shutter, 1.0 / 8000, 30);
            var settable = SettableExposure.For(Computed(shutter, iso), FullFrame);
            Assert.InRange(settable.OffStops, -1 / 6.0 - 1e-9, 1 / 6.0 + 1e-9);
            Assert.InRange(settable.ShutterSeconds, 1.0 / 8000 / Math.Pow(2, 1 / 6.0), 30 * Math.Pow(2, 1 / 6.0));
        }
    }
}
