<#
.SYNOPSIS
    Times a 20,000-row inventory from Import-Csv through Test-InductionHazard against the same rows through a
    ForEach-Object that computes only the textbook emf and e/R, in the same process, for a ramp and a sine: both
    warmed up first, then timed alternately, the fastest round of each compared. Test-InductionHazard is timed
    serially (its default) and with -ThrottleLimit 2. A third pipeline gives the floor for any binary cmdlet: the same
    rows through a compiled cmdlet that only binds each row and writes it on (the shell's binding and writing, with no
    work), so that what the textbook pipeline leaves a module for its own work on a row is the difference of the two.
    A fourth gives what reading alone costs: the same rows through New-ConductiveItem, which reads each row into an
    item (its size, material, contact and their checks) and assesses nothing; Test-InductionHazard reads each row it
    assesses so, and more (its placement and inventory columns), so where this alone takes longer than the textbook
    pipeline on rows of items all different (-DistinctRows), no engine, however fast, brings Test-InductionHazard to it.
    The inventory's rings come in ten sizes, as an inventory repeats its items (rings of a size, a box of spanners), so
    that a row repeating an earlier one takes its result; with -DistinctRows every ring is a size of its own and every
    row is assessed. It also gives how long the runtime's garbage collections paused the serial runs, a round on
    average, and how many of them collected the older generations (1 and 2): what a run keeps alive while rows pass
    shows there more steadily than in the times, which this machine's neighbours move by a third.
#>
param(
    [string] $ModulePath = (Join-Path $PSScriptRoot '../../out/InductionHazard/InductionHazard.psd1'),
    [int] $Rows = 20000,
    [int] $Rounds = 3,
    [switch] $DistinctRows
)
Import-Module $ModulePath
$csv = Join-Path ([IO.Path]::GetTempPath()) 'induction-hazard-pipeline.csv'
$lines = [System.Collections.Generic.List[string]]::new()
$lines.Add('Name,Material,Diameter,WireDiameter,Contact')
# Ten sizes 18-27 mm, or (-DistinctRows) every row its own size from 18 to 28 mm.
foreach ($k in 1..$Rows) {
    $diameter = if ($DistinctRows) { (18 + 10.0 * $k / $Rows).ToString('R', [cultureinfo]::InvariantCulture) } else { 18 + ($k % 10) }
    $lines.Add("Ring $k,Copper,$diameter mm,2 mm,Skin")
}
[IO.File]::WriteAllLines($csv, $lines)
$sources = @{
    'ramp 1 T in 10 ms' = New-FieldWaveform -Ramp -From '0 T' -To '1 T' -Duration '10 ms' | New-FieldSource
    'sine 10 mT, 50 Hz' = New-FieldWaveform -Sine -Amplitude '10 mT' -Frequency '50 Hz' | New-FieldSource
}
$rho = 1.7241e-8
# The floor: a compiled cmdlet that takes each row from the pipeline and writes it on, doing nothing else.
Add-Type -TypeDefinition @'
using System.Management.Automation;
[Cmdlet(VerbsCommunications.Write, "RowUnchanged")]
public sealed class WriteRowUnchanged : PSCmdlet
{
    [Parameter(ValueFromPipeline = true)] public PSObject InputObject { get; set; }
    protected override void ProcessRecord() { WriteObject(InputObject); }
}
'@ -PassThru | Select-Object -First 1 | ForEach-Object { Import-Module -Assembly $_.Assembly }
$warm = Join-Path ([IO.Path]::GetTempPath()) 'induction-hazard-pipeline-warm.csv'
$lines.GetRange(0, 501) | Set-Content $warm
function Measure-Textbook([string] $Path) {
    Measure-Command {
        Import-Csv $Path | ForEach-Object {
            $d = [double]($_.Diameter -replace ' mm', '') / 1000; $w = 0.002
            $emf = [math]::PI * $d * $d / 4 * 100
            $emf / ($rho * [math]::PI * $d / ([math]::PI * $w * $w / 4))
        } | Out-Null
    }
}
function Measure-Floor([string] $Path) {
    Measure-Command { Import-Csv $Path | Write-RowUnchanged | Out-Null }
}
function Measure-Reading([string] $Path) {
    Measure-Command { Import-Csv $Path | New-ConductiveItem | Out-Null }
}
function Measure-Module([string] $Path, $Source, [int] $Threads = 1) {
    Measure-Command { Import-Csv $Path | Test-InductionHazard -Source $Source -ThrottleLimit $Threads -WarningAction SilentlyContinue | Out-Null }
}
# Both pipelines are warmed up on 500 rows first (whichever ran first would otherwise pay the shell's start-up),
# then each is timed $Rounds times alternately; the fastest round of each is compared.
foreach ($name in $sources.Keys) {
    $null = Measure-Textbook $warm
    $null = Measure-Floor $warm
    $null = Measure-Reading $warm
    $null = Measure-Module $warm $sources[$name]
    $null = Measure-Module $warm $sources[$name] 2
    $textbook = [double]::MaxValue; $floor = [double]::MaxValue; $reading = [double]::MaxValue; $module = [double]::MaxValue; $threaded = [double]::MaxValue
    $pause = 0.0; $gen1 = 0
    foreach ($round in 1..$Rounds) {
        $textbook = [math]::Min($textbook, (Measure-Textbook $csv).TotalSeconds)
        $floor = [math]::Min($floor, (Measure-Floor $csv).TotalSeconds)
        $reading = [math]::Min($reading, (Measure-Reading $csv).TotalSeconds)
        $paused = [GC]::GetTotalPauseDuration(); $older = [GC]::CollectionCount(1)
        $module = [math]::Min($module, (Measure-Module $csv $sources[$name]).TotalSeconds)
        $pause += ([GC]::GetTotalPauseDuration() - $paused).TotalMilliseconds; $gen1 += [GC]::CollectionCount(1) - $older
        $threaded = [math]::Min($threaded, (Measure-Module $csv $sources[$name] 2).TotalSeconds)
    }
    '{0}: {1} rows{10}, textbook {2:F2} s, Test-InductionHazard {3:F2} s (ratio {4:F1}), with -ThrottleLimit 2 {5:F2} s (ratio {6:F1}); a cmdlet that only passes rows on {7:F3} s, leaving a module {8:F1} us a row of its own work to match the textbook; reading the rows into items alone (New-ConductiveItem) {13:F3} s (ratio {14:F1}), {15:F1} us a row of its own (fastest of {9} rounds each, after a warm-up); garbage collections paused the serial runs {11:F0} ms a round, {12:F1} of them of the older generations' -f $name, $Rows, $textbook, $module, ($module / $textbook), $threaded, ($threaded / $textbook), $floor, (($textbook - $floor) / $Rows * 1e6), $Rounds, $(if ($DistinctRows) { ' (every one a ring of its own size)' } else { ' (rings of ten sizes)' }), ($pause / $Rounds), ($gen1 / $Rounds), $reading, ($reading / $textbook), (($reading - $floor) / $Rows * 1e6)
}
Remove-Item $csv, $warm
