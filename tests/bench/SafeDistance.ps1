<#
.SYNOPSIS
    Times Find-SafeDistance for an aluminium disc (the filament model) fixed on the axis of a 10 kHz heater coil, out
    to 2 m, or with -Magnet on the axis of a magnet's solenoid (radius 450 mm, 1.6 m long, 6,000 turns) whose 400 A
    run down in 20 ms (a fast dump), out to 5 m from 0.9 m: the search assesses the same item at many distances. Prints the fastest
    of three runs after a warm-up and the distance found; run it against two builds of the module, alternately, to
    compare them. With -Inventory, 20 rows of two ring sizes from the pipeline beside a busbar's 40 kA fault, out to
    3 m: rows that repeat an earlier row's item take its result.
.EXAMPLE
    dotnet pwsh -NoProfile -File tests/bench/SafeDistance.ps1 -ModulePath out/InductionHazard/InductionHazard.psd1
.EXAMPLE
    dotnet pwsh -NoProfile -File tests/bench/SafeDistance.ps1 -Magnet
#>
param(
    [string] $ModulePath = (Join-Path $PSScriptRoot '../../out/InductionHazard/InductionHazard.psd1'),
    [int] $Rounds = 3,
    [switch] $Magnet,
    [switch] $Inventory
)
Import-Module $ModulePath
if ($Inventory) {
    $fault = New-FieldWaveform -Fault -Current '40 kA' -XOverR 14 -Frequency '50 Hz' -ClearingTime '200 ms' |
        New-FieldSource -Busbar -Width '120 mm' -Thickness '10 mm' -Name 'Busbar B1'
    $rows = foreach ($k in 1..20) { [pscustomobject]@{ Name = "Ring $k"; Material = 'Copper'; Diameter = "$(50 + 10 * ($k % 2)) mm"; WireDiameter = '3 mm'; Contact = 'Loose'; AssetTag = "R-$k" } }
    $null = $rows[0] | Find-SafeDistance -Source $fault -From '70 mm, 0, 0' -Direction x -MaxDistance '3 m'
    $best = [double]::MaxValue
    foreach ($round in 1..$Rounds) {
        $best = [math]::Min($best, (Measure-Command { $null = $rows | Find-SafeDistance -Source $fault -From '70 mm, 0, 0' -Direction x -MaxDistance '3 m' }).TotalSeconds)
    }
    '20 rows of two ring sizes: {0:F2} s (fastest of {1})' -f $best, $Rounds
    return
}
$search = if ($Magnet) {
    @{
        Source = New-FieldWaveform -Ramp -From '400 A' -To '0 A' -Duration '20 ms' | New-FieldSource -Solenoid -Radius '450 mm' -Length '1.6 m' -Turns 6000 -Name 'Magnet'
        From = '0, 0, 0.9'; MaxDistance = '5 m'
    }
}
else {
    @{ Source = New-FieldWaveform -Sine -Amplitude '50 A' -Frequency '10 kHz' | New-FieldSource -Coil -Radius '100 mm' -Turns 2000 -Name 'Heater coil'; MaxDistance = '2 m' }
}
$disc = New-ConductiveItem -Name 'Fixture disc' -Shape Disc -Material Aluminium -Diameter '40 mm' -Thickness '3 mm' -Contact Fixed
$null = Find-SafeDistance -Item $disc -Direction z @search
$found = $null
$times = foreach ($round in 1..$Rounds) {
    (Measure-Command { $script:found = Find-SafeDistance -Item $disc -Direction z @search }).TotalSeconds
}
'{0}: {1:F2} s (fastest of {2}), distance {3} m' -f $ModulePath, ($times | Measure-Object -Minimum).Minimum, $Rounds, $found.DistanceMeters
