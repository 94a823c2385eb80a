namespace LunarShadow.Astronomy.Time;

/// <summary>A model of ΔT = TT − UT1 over the supported years.</summary>
public interface IDeltaTModel
{
    /// <summary>The model's public name (e.g. <c>best</c>, <c>espenak-meeus-2006</c>).</summary>
    string Name { get; }

    /// <summary>ΔT at a decimal year (Julian years from year 0, so 2000.0 is J2000.0).</summary>
    DeltaT At(double decimalYear);
}
