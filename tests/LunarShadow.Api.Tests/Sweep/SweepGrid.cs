using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Frames;
using LunarShadow.Astronomy.Photography;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Sites;
using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;
using NodaTime;

namespace LunarShadow.Api.Tests.Sweep;

/// <summary>One site of the sweep, with the opening hours it asks about (if any).</summary>
internal sealed record SweepSite(string Label, Site Site, OpeningHours? Open = null);

/// <summary>The space the sweep walks: eclipses, sites and cameras.</summary>
internal static class SweepGrid
{
    public static readonly TimeScaleConverter Time = TimeScaleConverter.Default;

    /// <summary>Every eclipse (penumbral, partial, total) with greatest eclipse in 1900–2100.</summary>
    public static IReadOnlyList<LunarEclipse> Eclipses { get; } = EclipseFinder.For(ShadowModel.Danjon)
        .Between(Tt(1900, 1, 1), Tt(2101, 1, 1)).ToList();

    // Invented demo sites at real coordinates: both hemispheres, ±70° and beyond (polar day and night), the equator,
    // longitudes near ±180°, heights from 0 to 5000 m, zones with daylight saving and with half- and quarter-hour offsets,
    // horizon profiles, minimum altitudes and opening hours.
    public static IReadOnlyList<SweepSite> Sites { get; } =
    [
        At("arctic-70N", 70.0, 23.0, 10, "Europe/Oslo"),
        At("svalbard-78N", 78.2, 15.6, 20, "Arctic/Longyearbyen"),
        At("antarctic-70S", -70.0, 11.8, 1300, "Antarctica/Troll"),
        At("mcmurdo-78S", -77.85, 166.67, 20, "Antarctica/McMurdo"),
        At("equator-gabon", 0, 11.42, 0, "Africa/Libreville"),
        At("equator-andes", -0.2, -78.5, 2850, "America/Guayaquil"),
        At("fiji-179E", -17.7, 179.95, 5, "Pacific/Fiji"),
        At("tonga-179W", -21.1, -179.95, 5, "Pacific/Tongatapu"),
        At("kiritimati", 1.87, -157.4, 3, "Pacific/Kiritimati"),
        At("kathmandu", 27.7, 85.3, 1400, "Asia/Kathmandu"),
        At("adelaide", -34.9, 138.6, 50, "Australia/Adelaide", open: new OpeningHours(new LocalTime(19, 0), new LocalTime(23, 30))),
        At("chatham", -43.95, -176.55, 30, "Pacific/Chatham"),
        At("delhi", 28.6, 77.2, 215, "Asia/Kolkata"),
        At("st-johns", 47.56, -52.7, 100, "America/St_Johns"),
        At("zurich-hill", 47.3, 8.2, 550, "Europe/Zurich", open: new OpeningHours(new LocalTime(20, 0), new LocalTime(1, 0))),
        At("new-york", 40.71, -74.0, 10, "America/New_York", horizon: [(60, 8), (120, 15), (240, 4), (300, 20)]),
        At("santiago", -33.45, -70.67, 570, "America/Santiago", horizon: [(45, 6), (90, 25), (135, 10)]),
        At("mauna-kea", 19.82, -155.47, 4200, "Pacific/Honolulu"),
        At("plateau-5000m", 30.0, 90.0, 5000, "Asia/Shanghai", minAltitude: 5),
        At("cape-town", -33.9, 18.4, 20, "Africa/Johannesburg", open: new OpeningHours(new LocalTime(18, 30), new LocalTime(22, 0))),
        At("tokyo", 35.7, 139.7, 40, "Asia/Tokyo"),
        At("sydney", -33.87, 151.2, 60, "Australia/Sydney", horizon: [(0, 3), (90, 2), (180, 12), (270, 30)]),
        At("lisbon", 38.7, -9.1, 80, "Europe/Lisbon", minAltitude: 10),
        At("los-angeles", 34.05, -118.25, 90, "America/Los_Angeles", open: new OpeningHours(new LocalTime(19, 0), new LocalTime(23, 30))),
        At("moscow", 55.75, 37.6, 150, "Europe/Moscow", horizon: [(100, 10), (260, 10)]),
        At("nuuk", 64.18, -51.7, 30, "America/Nuuk"),
        At("null-island", 0, 0, 0, "UTC"),
        At("punta-arenas", -53.15, -70.9, 30, "America/Punta_Arenas"),
    ];

    /// <summary>Two camera set-ups, each tried on every mount.</summary>
    public static IReadOnlyList<Camera> Cameras { get; } =
    [
        // A full-frame body behind a 600 mm lens with a 1.4× converter.
        new(36, 24, 4.3, 600, 1.4, Mount.FixedTripod, 800, 6.3),
        // An APS-C body on a 200 mm zoom with a narrower shutter range (1/4000 to 15 s).
        new(23.5, 15.6, 3.9, 200, 1, Mount.FixedTripod, 400, 5.6, null, 1.0 / 4000, 15),
    ];

    public static IReadOnlyList<Mount> Mounts { get; } = [Mount.FixedTripod, Mount.SiderealTracking, Mount.LunarTracking];

    public static TtInstant Tt(int year, int month, int day) =>
        TtInstant.FromJulianDate(JulianDate.FromCalendar(year, month, day).Day);

    private static SweepSite At(string label, double lat, double lon, double elevation, string zone,
        (double, double)[]? horizon = null, double minAltitude = 0, OpeningHours? open = null) =>
        new(label, new Site(GeodeticLocation.FromDegrees(lat, lon, elevation), DateTimeZoneProviders.Tzdb[zone],
            horizon is null ? HorizonProfile.Flat : new HorizonProfile(horizon), Angle.FromDegrees(minAltitude), AirConditions.Standard, label), open);
}
