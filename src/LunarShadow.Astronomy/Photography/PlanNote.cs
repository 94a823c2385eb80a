using NodaTime;

namespace LunarShadow.Astronomy.Photography;

/// <summary>
/// A note that holds for a contiguous run of timeline rows, given once for the run instead of on every row (e.g. the
/// ISO raised through totality).
/// </summary>
/// <param name="Code">What it is.</param>
/// <param name="FromUtc">The first row of the run, UTC.</param>
/// <param name="ToUtc">The last row of the run, UTC.</param>
/// <param name="FirstRow">Index of the run's first row in the timeline.</param>
/// <param name="Rows">How many rows the run holds.</param>
/// <param name="Numbers">Its numbers, by name (as documented on the code, the changed value as its lowest and highest over the run).</param>
public sealed record PlanNote(PhotoWarningCode Code, Instant FromUtc, Instant ToUtc, int FirstRow, int Rows, IReadOnlyDictionary<string, double> Numbers);

/// <summary>Gathers the warnings that repeat row after row into one note per contiguous run.</summary>
public static class PlanNotes
{
    /// <summary>The codes given once per run: a setting change that holds while the light stays out of range.</summary>
    public static IReadOnlyList<PhotoWarningCode> GroupedCodes { get; } = [PhotoWarningCode.IsoChanged];

    /// <summary>
    /// The rows without the grouped warnings, and one note per contiguous run of rows that carried one. An ISO change
    /// note gives fromIso and the lowest and highest ISO over the run (lowestIso, highestIso).
    /// </summary>
    public static (IReadOnlyList<TimelineRow> Rows, IReadOnlyList<PlanNote> Notes) Group(IReadOnlyList<TimelineRow> rows)
    {
        var notes = new List<PlanNote>();
        foreach (var code in GroupedCodes)
        {
            for (var i = 0; i < rows.Count;)
            {
                if (rows[i].Warnings.All(w => w.Code != code)) { i++; continue; }
                var j = i;
                while (j + 1 < rows.Count && rows[j + 1].Warnings.Any(w => w.Code == code)) j++;
                var run = Enumerable.Range(i, j - i + 1).Select(k => rows[k].Warnings.First(w => w.Code == code)).ToList();
                notes.Add(new PlanNote(code, rows[i].Utc, rows[j].Utc, i, j - i + 1, Numbers(code, run)));
                i = j + 1;
            }
        }
        var kept = rows.Select(r => r with { Warnings = r.Warnings.Where(w => !GroupedCodes.Contains(w.Code)).ToList() }).ToList();
        return (kept, notes.OrderBy(n => n.FirstRow).ToList());
    }

    private static Dictionary<string, double> Numbers(PhotoWarningCode code, List<PhotoWarning> run) => code switch
    {
        PhotoWarningCode.IsoChanged => new Dictionary<string, double>
        {
            ["fromIso"] = run[0]["fromIso"] ?? 0,
            ["lowestIso"] = run.Min(w => w["toIso"] ?? 0),
            ["highestIso"] = run.Max(w => w["toIso"] ?? 0),
        },
        _ => new Dictionary<string, double>(run[0].Numbers),
    };
}
