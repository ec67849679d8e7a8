<#
.SYNOPSIS
    Times Find-SafeDistance for an aluminium disc (the filament model) fixed on the axis of a 10 kHz heater coil, out
    to 2 m: the search assesses the same item at many distances. Prints the fastest of three runs after a warm-up and
    the distance found; run it against two builds of the module, alternately, to compare them.
.EXAMPLE
    dotnet pwsh -NoProfile -File tests/bench/SafeDistance.ps1 -ModulePath out/InductionHazard/InductionHazard.psd1
#>
param(
    [string] $ModulePath = (Join-Path $PSScriptRoot '../../out/InductionHazard/InductionHazard.psd1'),
    [int] $Rounds = 3
)
Import-Module $ModulePath
$coil = New-FieldWaveform -Sine -Amplitude '50 A' -Frequency '10 kHz' | New-FieldSource -Coil -Radius '100 mm' -Turns 2000 -Name 'Heater coil'
$disc = New-ConductiveItem -Name 'Fixture disc' -Shape Disc -Material Aluminium -Diameter '40 mm' -Thickness '3 mm' -Contact Fixed
$null = Find-SafeDistance -Item $disc -Source $coil -Direction z -MaxDistance '2 m'
$found = $null
$times = foreach ($round in 1..$Rounds) {
    (Measure-Command { $script:found = Find-SafeDistance -Item $disc -Source $coil -Direction z -MaxDistance '2 m' }).TotalSeconds
}
'{0}: {1:F2} s (fastest of {2}), distance {3} m' -f $ModulePath, ($times | Measure-Object -Minimum).Minimum, $Rounds, $found.DistanceMeters
