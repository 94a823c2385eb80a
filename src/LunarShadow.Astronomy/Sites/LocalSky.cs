using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Frames;
using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Sites;

/// <summary>The Moon as seen from a site at one instant.</summary>
/// <param name="TrueAltitude">Topocentric altitude of the centre without refraction.</param>
/// <param name="ApparentAltitude">Topocentric altitude of the centre with refraction.</param>
/// <param name="UpperLimbApparentAltitude">Apparent altitude of the upper limb.</param>
/// <param name="Azimuth">Azimuth from north through east.</param>
/// <param name="ParallacticAngle">Position angle of the zenith on the Moon's disc, from north through east.</param>
/// <param name="SemiDiameter">Topocentric semi-diameter.</param>
public readonly record struct LocalMoon(
    Angle TrueAltitude, Angle ApparentAltitude, Angle UpperLimbApparentAltitude, Angle Azimuth, Angle ParallacticAngle, Angle SemiDiameter);

/// <summary>
/// The sky of one eclipse night seen from one site: the Moon's and Sun's topocentric places, evaluated on the night's
/// fitted vectors with the site's rotation, parallax and refraction.
/// </summary>
public sealed class LocalSky
{
    private readonly EclipseNightSky _night;
    private readonly Site _site;
    private readonly double _deltaTSeconds;
    private readonly CartesianVector _siteEarthFixed, _east, _north, _up;

    /// <summary>The sky of an eclipse night from a site, with the ΔT that ties TT to the Earth's rotation.</summary>
    public LocalSky(EclipseNightSky night, Site site, double deltaTSeconds)
    {
        _night = night;
        _site = site;
        _deltaTSeconds = deltaTSeconds;
        _siteEarthFixed = site.Location.EarthFixedKm();
        var (sinLat, cosLat) = Math.SinCos(site.Location.Latitude.Radians);
        var (sinLon, cosLon) = Math.SinCos(site.Location.Longitude.Radians);
        _east = new CartesianVector(-sinLon, cosLon, 0);
        _north = new CartesianVector(-sinLat * cosLon, -sinLat * sinLon, cosLat);
        _up = new CartesianVector(cosLat * cosLon, cosLat * sinLon, sinLat);
    }

    /// <summary>The site.</summary>
    public Site Site => _site;

    /// <summary>The night's fit.</summary>
    public EclipseNightSky Night => _night;

    /// <summary>The Moon at some hours from greatest eclipse.</summary>
    public LocalMoon MoonAt(double hours)
    {
        var gast = SiderealTime(hours);
        var moon = _night.MoonKm(hours);
        var (horizontal, distance, topocentricTrueOfDate) = Horizontal(moon, gast);
        var semiDiameter = BodyDisc.MoonSemiDiameter(distance);
        var trueAltitude = horizontal.Altitude;
        var limbTrue = trueAltitude + semiDiameter;

        // Meeus (1998), eq. 14.1: the parallactic angle q from the hour angle, declination and latitude.
        var declination = topocentricTrueOfDate.Latitude.Radians;
        var hourAngle = gast.Radians + _site.Location.Longitude.Radians - topocentricTrueOfDate.Longitude.Radians;
        var latitude = _site.Location.Latitude.Radians;
        var q = Math.Atan2(Math.Sin(hourAngle), Math.Tan(latitude) * Math.Cos(declination) - Math.Sin(declination) * Math.Cos(hourAngle));

        return new LocalMoon(
            trueAltitude,
            AtmosphericRefraction.Apply(trueAltitude, _site.Air),
            AtmosphericRefraction.Apply(limbTrue, _site.Air),
            horizontal.Azimuth,
            Angle.FromRadians(q).NormalizedPositive(),
            semiDiameter);
    }

    /// <summary>
    /// Just the apparent altitude of the Moon's upper limb and its azimuth (radians): the cheap evaluation that horizon
    /// searches sample.
    /// </summary>
    public (double UpperLimbAltitude, double Azimuth) MoonLimbAt(double hours)
    {
        var (horizontal, distance, _) = Horizontal(_night.MoonKm(hours), SiderealTime(hours));
        var limbTrue = horizontal.Altitude + BodyDisc.MoonSemiDiameter(distance);
        return (AtmosphericRefraction.Apply(limbTrue, _site.Air).Radians, horizontal.Azimuth.Radians);
    }

    /// <summary>The Sun's true (airless) altitude at some hours from greatest eclipse.</summary>
    public Angle SunAltitudeAt(double hours) => Horizontal(_night.SunKm(hours), SiderealTime(hours)).Horizontal.Altitude;

    /// <summary>The instant some hours from greatest eclipse.</summary>
    public TtInstant InstantAt(double hours) => _night.InstantAt(hours);

    private Angle SiderealTime(double hours)
    {
        var tt = _night.InstantAt(hours);
        return _night.SiderealTime(tt, new Ut1Instant(tt.JulianDate.PlusSeconds(-_deltaTSeconds)));
    }

    private (HorizontalCoordinates Horizontal, double Distance, CartesianVector TopocentricTrueOfDate) Horizontal(CartesianVector bodyTrueOfDate, Angle gast)
    {
        // Into the Earth-fixed frame (a rotation by the sidereal time; polar motion neglected), then about the site.
        var earthFixed = RotationMatrix.AboutZ(gast.Radians) * bodyTrueOfDate;
        var relative = earthFixed - _siteEarthFixed;
        var horizontal = HorizontalCoordinates.FromLocalComponents(relative.Dot(_north), relative.Dot(_east), relative.Dot(_up));
        var topocentricTrueOfDate = RotationMatrix.AboutZ(-gast.Radians) * relative;
        return (horizontal, relative.Length, topocentricTrueOfDate);
    }
}
