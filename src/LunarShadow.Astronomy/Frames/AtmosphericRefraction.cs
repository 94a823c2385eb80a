using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Frames;

/// <summary>Air pressure and temperature at the observer, for refraction.</summary>
/// <param name="PressureHectopascals">Air pressure, hPa (default 1010).</param>
/// <param name="TemperatureCelsius">Air temperature, °C (default 10).</param>
public readonly record struct AirConditions(double PressureHectopascals, double TemperatureCelsius)
{
    /// <summary>The conditions the refraction formulae are normalised to: 1010 hPa, 10 °C.</summary>
    public static AirConditions Standard => new(1010, 10);

    // Meeus (1998), ch. 16, eq. 16.5 and following: refraction scales with (P/1010)·(283/(273 + T)).
    internal double Factor => PressureHectopascals / 1010.0 * (283.0 / (273.0 + TemperatureCelsius));
}

/// <summary>Atmospheric refraction near the horizon.</summary>
public static class AtmosphericRefraction
{
    // Below this true altitude the formulae lose meaning; the refraction is held at its value there, so the
    // refracted altitude stays continuous and increasing.
    private const double LowestTrueAltitudeDegrees = -2.0;

    // Sæmundsson (1986), Sky & Telescope 72, 70; Meeus (1998) eq. 16.4: R′ = 1.02 / tan(h + 10.3/(h + 5.11)), h true altitude (°).
    /// <summary>Refraction to add to a true (airless) altitude to get the apparent altitude.</summary>
    public static Angle FromTrueAltitude(Angle trueAltitude, AirConditions air)
    {
        var h = Math.Max(trueAltitude.Degrees, LowestTrueAltitudeDegrees);
        var arcminutes = 1.02 / Math.Tan(Angle.FromDegrees(h + 10.3 / (h + 5.11)).Radians);
        return Angle.FromDegrees(arcminutes / 60.0 * air.Factor);
    }

    // Bennett (1982), J. Navigation 35, 255; Meeus (1998) eq. 16.3: R′ = 1 / tan(h₀ + 7.31/(h₀ + 4.4)), h₀ apparent altitude (°).
    /// <summary>Refraction to subtract from an apparent altitude to get the true altitude.</summary>
    public static Angle FromApparentAltitude(Angle apparentAltitude, AirConditions air)
    {
        var h = Math.Max(apparentAltitude.Degrees, LowestTrueAltitudeDegrees + 0.5);
        var arcminutes = 1.0 / Math.Tan(Angle.FromDegrees(h + 7.31 / (h + 4.4)).Radians);
        return Angle.FromDegrees(arcminutes / 60.0 * air.Factor);
    }

    /// <summary>The apparent (refracted) altitude of a true altitude.</summary>
    public static Angle Apply(Angle trueAltitude, AirConditions air) => trueAltitude + FromTrueAltitude(trueAltitude, air);
}
