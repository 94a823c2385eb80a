using LunarShadow.Astronomy.Ephemeris;
using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Frames;

/// <summary>
/// Apparent geocentric and topocentric places of the Sun and Moon: ELP/MPP02 and VSOP87 in the J2000 ecliptic,
/// rotated to the J2000 equator (ε₀ = 84381.406″), precessed (Vondrák et al. 2011), nutated (IAU 2000B), with light
/// time and annual aberration.
/// </summary>
public sealed class ApparentPlaceCalculator(LunarTheory moon, EarthOrbitTheory earth)
{
    /// <summary>The calculator on the embedded series (truncated ELP/MPP02, full VSOP87B).</summary>
    public static ApparentPlaceCalculator Default { get; } = new(LunarTheory.Truncated, EarthOrbitTheory.Vsop87B);

    private static readonly Lazy<ApparentPlaceCalculator> ScreeningCalculator =
        new(() => new ApparentPlaceCalculator(LunarTheory.Screening, EarthOrbitTheory.Screening));

    /// <summary>The calculator on the screening series (good to some 20″), for cheap first looks such as eclipse screening.</summary>
    public static ApparentPlaceCalculator Screening => ScreeningCalculator.Value;

    private static readonly RotationMatrix EclipticToEquatorJ2000 = RotationMatrix.AboutX(-VondrakPrecession.ObliquityAtJ2000.Radians);

    /// <summary>
    /// The matrix from the J2000 ecliptic of the theories to the true equator and equinox of date, with the nutation and
    /// mean obliquity it used.
    /// </summary>
    public static (RotationMatrix Matrix, Nutation Nutation, Angle MeanObliquity) ToTrueEquatorOfDate(TtInstant tt)
    {
        var nutation = NutationIau2000B.At(tt);
        var meanObliquity = Obliquity.Mean(tt);
        return (nutation.Matrix(meanObliquity) * VondrakPrecession.Matrix(tt) * EclipticToEquatorJ2000, nutation, meanObliquity);
    }

    /// <summary>The Sun and Moon from the Earth's centre at an instant given in both TT and UT1.</summary>
    public GeocentricSky Geocentric(TtInstant tt, Ut1Instant ut1)
    {
        var (toTrueOfDate, nutation, meanObliquity) = ToTrueEquatorOfDate(tt);
        var trueObliquity = meanObliquity + nutation.InObliquity;
        var (moonApparent, sunApparent) = ApparentVectorsJ2000Ecliptic(tt);
        var moonPlace = Place(toTrueOfDate * moonApparent, trueObliquity, BodyDisc.MoonSemiDiameter);
        var sunPlace = Place(toTrueOfDate * sunApparent, trueObliquity, BodyDisc.SunSemiDiameter);
        var gast = EarthRotation.GreenwichApparentSiderealTime(ut1, tt, nutation, meanObliquity);
        return new GeocentricSky(tt, ut1, moonPlace, sunPlace, nutation, meanObliquity, gast);
    }

    /// <summary>
    /// The apparent geocentric vectors of the Moon and Sun (km), still in the J2000 ecliptic of the theories: light time
    /// and aberration applied, precession and nutation not yet. Angles between them are already those of date.
    /// </summary>
    public (CartesianVector MoonKm, CartesianVector SunKm) ApparentVectorsJ2000Ecliptic(TtInstant tt)
    {
        // The Moon: its geocentric position one light time earlier. The Earth's own motion during that light time
        // and the annual aberration cancel for a body that travels with the Earth, so only the Moon's motion counts.
        var moonState = moon.GeocentricState(tt);
        var moonLightTimeDays = moonState.PositionKm.Length / AnnualAberration.SpeedOfLightKmPerDay;
        var moonApparent = moonState.PositionKm - moonState.VelocityKmPerDay * moonLightTimeDays;

        // The Sun: at rest in the heliocentric frame, so light time leaves its direction unchanged; annual aberration
        // comes from the Earth's heliocentric velocity (the negated velocity of the geocentric Sun).
        var sunState = earth.GeocentricSun(tt);
        var sunDistance = sunState.PositionKm.Length;
        var sunApparent = AnnualAberration.Apply(sunState.PositionKm, -sunState.VelocityKmPerDay) * sunDistance;
        return (moonApparent, sunApparent);
    }

    /// <summary>A body's place seen from a site: full parallax, horizontal coordinates, refraction.</summary>
    public static TopocentricPlace Topocentric(ApparentPlace body, Angle greenwichApparentSiderealTime, GeodeticLocation site, AirConditions air)
    {
        var siteTrueOfDate = RotationMatrix.AboutZ(-greenwichApparentSiderealTime.Radians) * site.EarthFixedKm();
        var topocentric = body.TrueEquatorialKm - siteTrueOfDate;
        var rightAscension = topocentric.Longitude;
        var declination = topocentric.Latitude;
        var distance = topocentric.Length;
        var hourAngle = (greenwichApparentSiderealTime + site.Longitude - rightAscension).NormalizedSigned();
        var horizontal = HorizontalCoordinates.FromHourAngle(hourAngle, declination, site.Latitude);
        var semiDiameter = BodyDisc.AtDistance(body.SemiDiameter, body.DistanceKm, distance);
        return new TopocentricPlace(
            rightAscension, declination, distance, hourAngle,
            horizontal.Altitude, AtmosphericRefraction.Apply(horizontal.Altitude, air), horizontal.Azimuth, semiDiameter);
    }

    private static ApparentPlace Place(CartesianVector trueEquatorial, Angle trueObliquity, Func<double, Angle> semiDiameter)
    {
        var distance = trueEquatorial.Length;
        var ecliptic = RotationMatrix.AboutX(trueObliquity.Radians) * trueEquatorial;
        return new ApparentPlace(
            trueEquatorial.Longitude, trueEquatorial.Latitude, distance,
            ecliptic.Longitude, ecliptic.Latitude,
            semiDiameter(distance), BodyDisc.HorizontalParallax(distance), trueEquatorial);
    }
}
