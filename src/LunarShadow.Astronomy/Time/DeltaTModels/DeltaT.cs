namespace LunarShadow.Astronomy.Time;

/// <summary>ΔT = TT − UT1 in seconds, with the uncertainty its model states and the model's name.</summary>
/// <param name="Seconds">TT − UT1 in SI seconds.</param>
/// <param name="UncertaintySeconds">One-sigma uncertainty in seconds, by the model's documented rule.</param>
/// <param name="Model">The name of the model that gave the value.</param>
public readonly record struct DeltaT(double Seconds, double UncertaintySeconds, string Model);
