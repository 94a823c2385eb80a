using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Frames;

/// <summary>Annual aberration of light.</summary>
public static class AnnualAberration
{
    /// <summary>The speed of light, km/day (IAU: 299 792.458 km/s).</summary>
    public const double SpeedOfLightKmPerDay = 299_792.458 * 86400.0;

    // Explanatory Supplement to the Astronomical Almanac (2013), §7.2.3, first order in v/c:
    // u′ = u + v/c − (u·v/c)·u, renormalised; ample for the 20.5″ effect.
    /// <summary>The apparent direction of a body seen from an observer moving with the given velocity (km/day).</summary>
    public static CartesianVector Apply(CartesianVector direction, CartesianVector observerVelocityKmPerDay)
    {
        var u = direction.Normalized();
        var beta = observerVelocityKmPerDay / SpeedOfLightKmPerDay;
        return (u + beta - u.Dot(beta) * u).Normalized();
    }
}
