namespace LunarShadow.Astronomy.Eclipses;

/// <summary>Durations of the phases in minutes; null where the phase does not occur.</summary>
/// <param name="PenumbralMinutes">P1 to P4.</param>
/// <param name="PartialMinutes">U1 to U4.</param>
/// <param name="TotalMinutes">U2 to U3.</param>
public sealed record PhaseDurations(double PenumbralMinutes, double? PartialMinutes, double? TotalMinutes);
