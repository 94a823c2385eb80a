using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Frames;

/// <summary>
/// The Moon's physical ephemeris for one observer (the Earth's centre, or a site): total (optical + physical) libration
/// — the selenographic point at the centre of the disc —, the position angle of the axis and the sub-solar point.
/// </summary>
/// <param name="Libration">Selenographic latitude and longitude of the sub-observer point (libration in latitude and longitude).</param>
/// <param name="AxisPositionAngle">Position angle of the Moon's north pole, from celestial north through east.</param>
/// <param name="SubSolarPoint">Selenographic latitude and longitude of the sub-solar point.</param>
public sealed record MoonPhysicalEphemeris(SelenographicPoint Libration, Angle AxisPositionAngle, SelenographicPoint SubSolarPoint)
{
    /// <summary>
    /// The physical ephemeris from the apparent vectors of date (km, true equator and equinox): the Moon seen from the
    /// observer (geocentric, or topocentric minus the site), and the Sun from the Earth's centre.
    /// </summary>
    public static MoonPhysicalEphemeris Compute(MoonOrientation orientation, CartesianVector observerToMoonKm, CartesianVector earthToMoonKm, CartesianVector earthToSunKm) => new(
        orientation.PointToward(-observerToMoonKm),
        orientation.AxisPositionAngle(observerToMoonKm),
        orientation.PointToward(earthToSunKm - earthToMoonKm));
}
