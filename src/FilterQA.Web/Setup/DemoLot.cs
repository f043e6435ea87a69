using FilterQA.Core.Synthesis;

namespace FilterQA.Web.Setup;

/// <summary>
/// One invented demo lot: which part, from whom, how many units to test and which serials are defective.
/// <see cref="UnitsToTest"/> null tests the whole sample; <see cref="Decide"/> dispositions the lot afterwards.
/// </summary>
internal sealed record DemoLot(string LotNumber, string PartNumber, string Supplier, int Quantity, string DateCode, string SupplierLot,
    string Station, string OperatorUserName, int? UnitsToTest, IReadOnlyDictionary<int, DefectKind> Defects, bool Decide);
