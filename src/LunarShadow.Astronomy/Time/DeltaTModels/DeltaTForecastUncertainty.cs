namespace LunarShadow.Astronomy.Time;

/// <summary>
/// The one-sigma error of a ΔT forecast made <c>N</c> years ahead, σ(N) = <see cref="SecondsAtOneYear"/>·N^<see cref="Exponent"/>,
/// fitted to hindcasts of the forecast method on the measured record (<see cref="DeltaTHindcast"/>).
/// </summary>
/// <param name="SecondsAtOneYear">σ one year ahead, seconds.</param>
/// <param name="Exponent">How σ grows with the years ahead (1 for a constant rate error, 2 for a constant acceleration error).</param>
/// <param name="LongestHindcastYears">The longest forecast the hindcasts tested; beyond it the law is extrapolated.</param>
public readonly record struct DeltaTForecastUncertainty(double SecondsAtOneYear, double Exponent, double LongestHindcastYears)
{
    /// <summary>σ of a forecast <paramref name="yearsAhead"/> years beyond the last data, seconds (0 at or before it).</summary>
    public double SecondsAfter(double yearsAhead) => yearsAhead <= 0 ? 0 : SecondsAtOneYear * Math.Pow(yearsAhead, Exponent);
}
