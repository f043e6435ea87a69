using FilterQA.Core.Decisions;

namespace FilterQA.Data.Services;

/// <summary>
/// A stored measurement the draft judges differently. <see cref="DecidingRules"/> are the draft's results of the rules
/// that make the difference: when the draft's verdict is not go, the rules that keep the unit from go under the draft;
/// when it is go, the rules that kept the unit from go in the record (now passing).
/// </summary>
/// <param name="LotNumber">The lot.</param>
/// <param name="Serial">The unit's serial.</param>
/// <param name="MeasurementId">The stored measurement judged again.</param>
/// <param name="Attempt">Its attempt number (1 = first measurement of the unit).</param>
/// <param name="IsCounted">The measurement is the unit's counted one (it decides the unit for the lot).</param>
/// <param name="IsFirstPass">The measurement is the unit's first (attempt 1).</param>
/// <param name="RecordedVerdict">The verdict stored with the measurement.</param>
/// <param name="WhatIfVerdict">The verdict under the draft.</param>
/// <param name="DecidingRules">The draft's results of the rules that decide the change (see above).</param>
public sealed record WhatIfFlip(string LotNumber, string Serial, long MeasurementId, int Attempt, bool IsCounted, bool IsFirstPass,
    UnitVerdict RecordedVerdict, UnitVerdict WhatIfVerdict, IReadOnlyList<RuleResult> DecidingRules);
