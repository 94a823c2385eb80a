namespace LunarShadow.Astronomy.Photography;

/// <summary>Dimming by the Earth's atmosphere along the line of sight.</summary>
public static class AtmosphericExtinction
{
    // Kasten & Young (1989), Appl. Opt. 28, 4735: X = 1 / (cos z + 0.50572·(96.07995° − z)^−1.6364), z the apparent
    // zenith distance in degrees; 38.09 at the horizon.
    /// <summary>Relative air mass at an apparent altitude in degrees (held at the horizon value below 0°).</summary>
    public static double AirMass(double apparentAltitudeDegrees)
    {
        var z = 90 - Math.Max(apparentAltitudeDegrees, 0);
        return 1 / (Math.Cos(z * Math.PI / 180) + 0.50572 * Math.Pow(96.07995 - z, -1.6364));
    }

    // Green (1992), International Comet Quarterly 14, 55: V-band extinction per air mass from Rayleigh scattering
    // 0.1451·e^(−H/7.996 km), aerosols 0.120·e^(−H/1.5 km) and ozone 0.016 (from memory).
    /// <summary>A typical V-band extinction coefficient, magnitudes per air mass, at a height in metres.</summary>
    public static double CoefficientForHeight(double heightMeters)
    {
        var h = Math.Max(heightMeters, 0) / 1000;
        return 0.1451 * Math.Exp(-h / 7.996) + 0.120 * Math.Exp(-h / 1.5) + 0.016;
    }
}
