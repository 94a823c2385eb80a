using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Frames;

/// <summary>Nutation in longitude and in obliquity.</summary>
/// <param name="InLongitude">Δψ.</param>
/// <param name="InObliquity">Δε.</param>
public readonly record struct Nutation(Angle InLongitude, Angle InObliquity)
{
    // IERS Conventions (2010), eq. 5.x (classical nutation matrix): N = R1(−(ε + Δε))·R3(−Δψ)·R1(ε).
    /// <summary>The matrix from the mean to the true equator and equinox of date, given the mean obliquity.</summary>
    public RotationMatrix Matrix(Angle meanObliquity) =>
        RotationMatrix.AboutX(-(meanObliquity.Radians + InObliquity.Radians))
        * RotationMatrix.AboutZ(-InLongitude.Radians)
        * RotationMatrix.AboutX(meanObliquity.Radians);
}
