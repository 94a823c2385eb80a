using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Ephemeris;

/// <summary>
/// Position and velocity referred to the mean ecliptic and equinox of J2000.0 (the inertial frame of
/// ELP/MPP02 and VSOP87), in kilometres and kilometres per day of TT.
/// </summary>
/// <param name="PositionKm">Position, km.</param>
/// <param name="VelocityKmPerDay">Velocity, km per day.</param>
public readonly record struct EclipticState(CartesianVector PositionKm, CartesianVector VelocityKmPerDay);
