using LunarShadow.Api.Formatting;
using LunarShadow.Api.Validation;
using LunarShadow.Astronomy.Embedded;
using LunarShadow.Astronomy.Ephemeris;
using LunarShadow.Astronomy.Frames;
using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;
using Microsoft.AspNetCore.Http.HttpResults;

namespace LunarShadow.Api.Ephemeris;

/// <summary>GET /api/v1/ephemeris: apparent places of the Sun and Moon.</summary>
internal static class EphemerisEndpoints
{
    public static IEndpointRouteBuilder MapEphemerisEndpoints(this IEndpointRouteBuilder routes)
    {
        routes.MapGet("/api/v1/ephemeris", Get)
            .WithName("GetEphemeris")
            .Takes(Takes)
            .WithTags("Ephemeris")
            .WithSummary("Apparent places of the Moon and Sun at one instant")
            .WithDescription("Geocentric apparent right ascension, declination and distance of date (ELP/MPP02, VSOP87, Vondrák 2011 precession, IAU 2000B nutation, light time and aberration), semi-diameters and parallaxes, and for the Moon its libration, the position angle of its axis and the sub-solar point (Meeus 1998, ch. 53); with a site, topocentric places with refraction, topocentric libration and axis.");
        return routes;
    }

    public static readonly Parameter Utc = new("utc", ParameterType.Instant,
        "The instant, ISO 8601 with Z or an offset, years −1999 to +3000 (e.g. 2025-03-14T06:58:00Z).")
    { Required = true };

    // The site is optional here: give lat and lon (with elevation and air) for topocentric places.
    private static readonly EndpointParameters Takes = new(
    [
        Utc, Parameters.Latitude with { Required = false }, Parameters.Longitude with { Required = false }, Parameters.Elevation,
        Parameters.Pressure, Parameters.Temperature, Parameters.DeltaT, Parameters.DeltaTModel,
    ]);

    internal static Results<Ok<EphemerisResponse>, ValidationProblem> Get(HttpRequest request)
    {
        var f = RequestFields.FromQuery(request, new QueryReader());
        var instant = f.Instant(Utc);
        var site = SiteParameters.ReadSite(f, required: false);
        var model = ModelChoice.DeltaT(f);
        if (!f.Reader.IsValid || instant is null) return Problems.InvalidQuery(f.Reader);

        var converter = new TimeScaleConverter(model);
        var tt = converter.ToTerrestrialTime(instant.Value);
        var ut1 = converter.ToUniversalTime(tt);
        var deltaTValue = converter.DeltaTAt(tt);
        var sky = ApparentPlaceCalculator.Default.Geocentric(tt, ut1);
        TopocentricPlace? Topocentric(ApparentPlace body) =>
            site is not null ? ApparentPlaceCalculator.Topocentric(body, sky.GreenwichApparentSiderealTime, site.Location, site.Air) : null;

        var moon = Body(sky.Moon, Topocentric(sky.Moon), isSun: false);
        var orientation = MoonOrientation.At(tt, sky.Nutation, sky.MeanObliquity);
        var geocentric = MoonPhysicalEphemeris.Compute(orientation, sky.Moon.TrueEquatorialKm, sky.Moon.TrueEquatorialKm, sky.Sun.TrueEquatorialKm);
        moon = moon with
        {
            Libration = Point(geocentric.Libration),
            AxisPositionAngleDegrees = TimeFormats.Round(geocentric.AxisPositionAngle.Degrees, 4),
            SubSolarPoint = Point(geocentric.SubSolarPoint),
        };
        if (site is not null && moon.Topocentric is { } seen)
        {
            // Seen from the site: the line of sight from the observer (true equator of date) replaces the geocentric one.
            var siteTrueOfDate = RotationMatrix.AboutZ(-sky.GreenwichApparentSiderealTime.Radians) * site.Location.EarthFixedKm();
            var fromSite = MoonPhysicalEphemeris.Compute(orientation, sky.Moon.TrueEquatorialKm - siteTrueOfDate, sky.Moon.TrueEquatorialKm, sky.Sun.TrueEquatorialKm);
            moon = moon with { Topocentric = seen with { Libration = Point(fromSite.Libration), AxisPositionAngleDegrees = TimeFormats.Round(fromSite.AxisPositionAngle.Degrees, 4) } };
        }

        return TypedResults.Ok(new EphemerisResponse(
            TimeFormats.Utc(instant.Value),
            TimeFormats.Tt(tt),
            TimeFormats.Round(tt.JulianDate.Day, 8),
            TimeFormats.Round(deltaTValue.Seconds, 3),
            TimeFormats.Round(deltaTValue.UncertaintySeconds, 3),
            deltaTValue.Model,
            "apparent place: true equator and equinox of date, geocentric unless under topocentric",
            moon,
            Body(sky.Sun, Topocentric(sky.Sun), isSun: true),
            EmbeddedDataSet.VersionTag));
    }

    private static LibrationResponse Point(SelenographicPoint point) =>
        new(TimeFormats.Round(point.Longitude.Degrees, 4), TimeFormats.Round(point.Latitude.Degrees, 4));

    private static BodyPlace Body(ApparentPlace place, TopocentricPlace? topocentric, bool isSun) => new(
        TimeFormats.Round(place.RightAscension.Hours, 7),
        TimeFormats.Round(place.Declination.Degrees, 6),
        TimeFormats.Round(place.DistanceKm, 1),
        isSun ? TimeFormats.Round(place.DistanceKm / EarthOrbitTheory.AstronomicalUnitKm, 8) : null,
        TimeFormats.Round(place.EclipticLongitude.Degrees, 6),
        TimeFormats.Round(place.EclipticLatitude.Degrees, 6),
        TimeFormats.Round(place.SemiDiameter.Arcseconds, 2),
        TimeFormats.Round(place.HorizontalParallax.Arcseconds, 3),
        topocentric is null ? null : new TopocentricBodyPlace(
            TimeFormats.Round(topocentric.RightAscension.Hours, 7),
            TimeFormats.Round(topocentric.Declination.Degrees, 6),
            TimeFormats.Round(topocentric.ApparentAltitude.Degrees, 4),
            TimeFormats.Round(topocentric.TrueAltitude.Degrees, 4),
            TimeFormats.Round(topocentric.Azimuth.Degrees, 4),
            TimeFormats.Round(topocentric.DistanceKm, 1),
            TimeFormats.Round(topocentric.SemiDiameter.Arcseconds, 2)));
}
