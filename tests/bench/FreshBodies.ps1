<#
.SYNOPSIS
    Times Test-InductionHazard for items of the filament model each of a size of its own, so that each builds its
    current paths afresh (their meshes, mutual inductances and modes): 40 mm-class aluminium discs (152 paths) and thick
    gold bands (60 paths) in the induction furnace's field (1.5 mT at 9.6 kHz, two minutes), and 10 mm-class copper
    rods 120 mm long (336 paths) held in a magnet's bore while it ramps to 7 T over ten minutes. Prints milliseconds an
    item, the fastest of three rounds after a warm-up; run it against two builds alternately to compare them.
.EXAMPLE
    dotnet pwsh -NoProfile -File tests/bench/FreshBodies.ps1 -ModulePath out/InductionHazard/InductionHazard.psd1
#>
param(
    [string] $ModulePath = (Join-Path $PSScriptRoot '../../out/InductionHazard/InductionHazard.psd1'),
    [int] $Rounds = 3
)
Import-Module $ModulePath
$furnace = New-FieldWaveform -Sine -Amplitude '1.5 mT' -Frequency '9.6 kHz' | New-FieldSource -Uniform -Name 'Furnace'
$magnet = New-FieldWaveform -Ramp -From '0 T' -To '7 T' -Duration '10 min' | New-FieldSource -Uniform -Name 'Magnet ramp'
$kinds = [ordered]@{
    'disc' = { param($k) New-ConductiveItem -Name "Disc $k" -Shape Disc -Material Aluminium -Diameter "$(40 + 0.1 * $k) mm" -Thickness '3 mm' -Contact Held }
    'band' = { param($k) New-ConductiveItem -Name "Band $k" -Shape Ring -Material Gold -InnerDiameter "$(17 + 0.05 * $k) mm" -Width '4 mm' -Thickness '1.6 mm' -Contact Skin }
    'rod' = { param($k) New-ConductiveItem -Name "Rod $k" -Shape Cylinder -Material Copper -Diameter "$(10 + 0.01 * $k) mm" -Length '120 mm' -Contact Held }
}
$places = @{
    'disc' = @{ Source = $furnace; ExposureTime = '2 min' }
    'band' = @{ Source = $furnace; ExposureTime = '2 min' }
    'rod' = @{ Source = $magnet }
}
$next = 0
foreach ($kind in $kinds.Keys) {
    $place = $places[$kind]
    $null = Test-InductionHazard -Item (& $kinds[$kind] 0) @place
    $best = [double]::MaxValue
    foreach ($round in 1..$Rounds) {
        $items = foreach ($i in 1..10) { $next++; & $kinds[$kind] $next }
        $t = Measure-Command { foreach ($item in $items) { $null = Test-InductionHazard -Item $item @place } }
        $best = [math]::Min($best, $t.TotalMilliseconds / $items.Count)
    }
    '{0}: {1:F1} ms an item, each built afresh (fastest of {2} rounds of 10)' -f $kind, $best, $Rounds
}
