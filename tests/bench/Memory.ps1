<#
.SYNOPSIS
    Streams N generated inventory rows through Test-InductionHazard into Out-Null and reports the process's peak
    working set, so that a run of 1,000,000 rows can be compared with one of 10,000 (each in a fresh process). The
    rings come in ten sizes, so that most rows repeat an earlier one and take its result; with -DistinctRows each ring
    is a size of its own and every row is solved.
.EXAMPLE
    dotnet pwsh -NoProfile -File tests/bench/Memory.ps1 -Rows 10000
    dotnet pwsh -NoProfile -File tests/bench/Memory.ps1 -Rows 1000000
#>
param(
    [string] $ModulePath = (Join-Path $PSScriptRoot '../../out/InductionHazard/InductionHazard.psd1'),
    [int] $Rows = 10000,
    # Print the working set and the managed heap every so many rows (0: only at the end).
    [int] $Every = 0,
    [switch] $DistinctRows
)
Import-Module $ModulePath
# Split rings at a 50 Hz sine: every row is read, bound, assessed and written, as an audit does; the rows are made
# as they are consumed, so nothing but the pipeline holds them.
$source = New-FieldWaveform -Sine -Amplitude '10 mT' -Frequency '50 Hz' | New-FieldSource -Uniform -Name 'Coil'
$process = [System.Diagnostics.Process]::GetCurrentProcess()
$before = $process.WorkingSet64
$clock = [System.Diagnostics.Stopwatch]::StartNew()
$count = 0
& { foreach ($k in 1..$Rows) { [pscustomobject]@{ Name = "Ring $k"; Material = 'Copper'; Diameter = "$(if ($DistinctRows) { (18 + 10.0 * $k / $Rows).ToString('R', [cultureinfo]::InvariantCulture) } else { 18 + ($k % 10) }) mm"; WireDiameter = '2 mm'; Gap = '1 mm'; Contact = 'Held' } } } |
    Test-InductionHazard -Source $source -WarningAction SilentlyContinue |
    ForEach-Object {
        $count++
        if ($Every -gt 0 -and $count % $Every -eq 0) {
            $process.Refresh()
            '{0,9} rows: working set {1:F0} MiB, managed heap {2:F0} MiB' -f $count, ($process.WorkingSet64 / 1MB), ([GC]::GetTotalMemory($false) / 1MB)
        }
    }
$process.Refresh()
'{0} rows assessed in {1:F0} s; working set before {2:F0} MiB, peak {3:F0} MiB' -f $count, $clock.Elapsed.TotalSeconds, ($before / 1MB), ($process.PeakWorkingSet64 / 1MB)
