namespace LunarShadow.Astronomy.Photography;

/// <summary>A suggested exposure.</summary>
/// <param name="ShutterSeconds">Shutter time, s.</param>
/// <param name="Iso">ISO speed.</param>
/// <param name="Aperture">f-number.</param>
/// <param name="Ev100">Exposure value at ISO 100 of the target (after placement).</param>
/// <param name="BracketShutters">Shutter times of the bracket, darkest first.</param>
/// <param name="IsoClamped">True when the ISO needed lies outside 25–409600 and was clamped.</param>
public sealed record Exposure(double ShutterSeconds, double Iso, double Aperture, double Ev100, IReadOnlyList<double> BracketShutters, bool IsoClamped);

/// <summary>The photographic exposure equation.</summary>
public static class ExposureCalculator
{
    // ISO 2720:1974: reflected-light meter calibration N²/t = L·S/K, with K = 12.5 cd·s/m² (common for camera meters).
    /// <summary>The reflected-light calibration constant K.</summary>
    public const double MeterConstant = 12.5;

    // Common practice: the sunlit lunar surface is rendered about one stop brighter than the middle grey a meter aims for
    // (this places the suggestion between the NASA guide's Q = 8 and the "looney 11" rule; tested against both).
    /// <summary>Stops added to the metered exposure so the lit surface renders light grey, not middle grey.</summary>
    public const double PlacementStops = 1.0;

    /// <summary>Lowest and highest ISO suggested.</summary>
    public const double MinIso = 25, MaxIso = 409600;

    /// <summary>EV at ISO 100 of a luminance (cd/m²): EV₁₀₀ = log₂(L·100/K).</summary>
    public static double Ev100(double luminance) => Math.Log2(luminance * 100 / MeterConstant);

    /// <summary>The exposure for a luminance with the camera's ISO and aperture (or its fixed shutter), and a bracket.</summary>
    public static Exposure For(double luminance, Camera camera, int bracketStops)
    {
        var ev = Ev100(luminance) - PlacementStops;
        var n = camera.EffectiveAperture;
        double shutter, iso;
        var clamped = false;
        if (camera.ShutterSeconds is { } fixedShutter)
        {
            shutter = fixedShutter;
            iso = 100 * n * n / (shutter * Math.Pow(2, ev));
            if (iso < MinIso || iso > MaxIso)
            {
                clamped = true;
                iso = Math.Clamp(iso, MinIso, MaxIso);
            }
        }
        else
        {
            iso = camera.Iso;
            shutter = n * n / (Math.Pow(2, ev) * iso / 100);
        }
        var bracket = Enumerable.Range(-bracketStops, 2 * bracketStops + 1).Select(k => shutter * Math.Pow(2, k)).ToList();
        return new Exposure(shutter, iso, n, ev, bracket, clamped);
    }
}
