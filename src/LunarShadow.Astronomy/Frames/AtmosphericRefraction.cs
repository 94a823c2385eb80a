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

/// <summary>
/// Atmospheric refraction near and above the horizon. The formulae are fitted down to about −2°; a body further below
/// cannot be seen through the air at all, so the correction is tapered linearly to zero between −2° and −5° and the
/// airless altitude is reported below −5° (the refracted altitude stays continuous and increasing throughout).
/// </summary>
public static class AtmosphericRefraction
{
    // Common practice: the refraction formulae hold down to about −2° (Meeus 1998, ch. 16, notes them valid to the
    // horizon and a little below); a linear taper to zero at −5° keeps apparent altitude continuous and increasing
    // (slope ≥ 0.75), and below it no refraction applies.
    private const double LowestFittedAltitudeDegrees = -2.0;
    private const double NoRefractionBelowDegrees = -5.0;

    // Sæmundsson (1986), Sky & Telescope 72, 70; Meeus (1998) eq. 16.4: R′ = 1.02 / tan(h + 10.3/(h + 5.11)), h true altitude (°).
    /// <summary>Refraction to add to a true (airless) altitude to get the apparent altitude (zero below −5°).</summary>
    public static Angle FromTrueAltitude(Angle trueAltitude, AirConditions air) =>
        Angle.FromDegrees(Taper(trueAltitude.Degrees, h => 1.02 / Math.Tan(Angle.FromDegrees(h + 10.3 / (h + 5.11)).Radians)) / 60.0 * air.Factor);

    // Bennett (1982), J. Navigation 35, 255; Meeus (1998) eq. 16.3: R′ = 1 / tan(h₀ + 7.31/(h₀ + 4.4)), h₀ apparent altitude (°).
    /// <summary>Refraction to subtract from an apparent altitude to get the true altitude (zero below −5°).</summary>
    public static Angle FromApparentAltitude(Angle apparentAltitude, AirConditions air) =>
        Angle.FromDegrees(Taper(apparentAltitude.Degrees, h => 1.0 / Math.Tan(Angle.FromDegrees(h + 7.31 / (h + 4.4)).Radians)) / 60.0 * air.Factor);

    /// <summary>The apparent (refracted) altitude of a true altitude.</summary>
    public static Angle Apply(Angle trueAltitude, AirConditions air) => trueAltitude + FromTrueAltitude(trueAltitude, air);

    // The formula's arc-minutes above −2°, tapered linearly to zero at −5°, zero below.
    private static double Taper(double degrees, Func<double, double> arcminutes)
    {
        if (degrees >= LowestFittedAltitudeDegrees) return arcminutes(degrees);
        if (degrees <= NoRefractionBelowDegrees) return 0;
        return arcminutes(LowestFittedAltitudeDegrees) * (degrees - NoRefractionBelowDegrees) / (LowestFittedAltitudeDegrees - NoRefractionBelowDegrees);
    }
}
