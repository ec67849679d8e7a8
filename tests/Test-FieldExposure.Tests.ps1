param([string] $ModulePath = (Join-Path $PSScriptRoot '../out/InductionHazard/InductionHazard.psd1'))

BeforeAll {
    Import-Module $ModulePath -Force
}

Describe 'Test-FieldExposure' {
    # Validates: a 50 Hz field at the occupational reference level from the cmdlet, margin 1 | ICNIRP 2010 table 3 | 1e-9
    It 'judges a mains-frequency field by its rms against the reference level, with the implant line' {
        $mains = New-FieldWaveform -Sine -Amplitude '1.4142135623730951 mT' -Frequency '50 Hz' | New-FieldSource -Uniform
        $e = Test-FieldExposure -Source $mains
        [math]::Abs($e.Margin - 1) | Should -BeLessThan 1e-9
        $e.Verdict | Should -Be 'Caution'
        $e.ImplantLineExceeded | Should -BeTrue
        $e.Finding | Should -Match '0.5 mT line'
        ($e.Cautions -join ' ') | Should -Match 'engineering estimates'
    }

    # Validates: a three-phase set's turning field from the cmdlet, judged by its resultant rms | the resultant field (root sum of squares of the components' rms) of three lines' fields, mu0 i / (2 pi r) each (Ampere's law), averaged over a period | 1e-9
    It 'judges the turning field beside a three-phase set by its resultant rms, not its peak over root 2' {
        # Three 1 kA (amplitude) conductors 100 mm apart along z, in a row along x (A at -100 mm), A, B, C 120 degrees
        # apart; 50 mm from the middle one along y. |B|^2 averaged over 64 instants of a period of the three lines' fields.
        $set = New-FieldWaveform -Sine -Amplitude '1 kA' -Frequency '50 Hz' | New-FieldSource -ThreePhase -Spacing '100 mm'
        $e = Test-FieldExposure -Source $set -Position '0, 50 mm, 0'
        $sum = 0.0
        foreach ($n in 0..63) {
            $wt = 2 * [math]::PI * $n / 64
            $bx = 0.0; $by = 0.0
            foreach ($k in 0..2) {
                $x = -0.1 + (0.1 * $k); $phase = (0, (-2 * [math]::PI / 3), (2 * [math]::PI / 3))[$k]
                $rx = 0 - $x; $ry = 0.05; $r2 = ($rx * $rx) + ($ry * $ry)
                $i = 1000 * [math]::Sin($wt + $phase) * 2e-7 / $r2
                $bx += -$ry * $i; $by += $rx * $i
            }
            $sum += ($bx * $bx) + ($by * $by)
        }
        $resultant = [math]::Sqrt($sum / 64)
        [math]::Abs($e.ComparedTesla / $resultant - 1) | Should -BeLessThan 1e-9
        $e.ComparedTesla | Should -BeGreaterThan (1.3 * $e.PeakFluxDensityTesla / [math]::Sqrt(2)) -Because 'the field turns as it alternates'
        $e.Basis | Should -Be 'sinusoid, resultant rms'
        $e.Finding | Should -Match 'resultant rms'
    }

    It 'gives one result per point, takes the public limits with -Public, and names a point where the field cannot be given' {
        $feeder = New-FieldWaveform -Sine -Amplitude '2 kA' -Frequency '50 Hz' | New-FieldSource -Conductor -Center '0, 0, 0'
        $worker = @(Test-FieldExposure -Source $feeder -Position '300 mm, 0, 0', '1 m, 0, 0')
        $visitor = @(Test-FieldExposure -Source $feeder -Position '300 mm, 0, 0', '1 m, 0, 0' -Public)
        $worker.Count | Should -Be 2
        $visitor[0].LimitTesla | Should -BeLessThan $worker[0].LimitTesla
        $worker[0].Margin | Should -BeLessThan $worker[1].Margin
        { Test-FieldExposure -Source $feeder -Position '0, 0, 0' -ErrorAction Stop } | Should -Throw -ExpectedMessage '*Position*'
    }

    It 'takes points piped in, as text or as rows with X, Y, Z or one Position column, the same as -Position; a row without a point is an error naming it, and the rest go on' {
        $feeder = New-FieldWaveform -Sine -Amplitude '2 kA' -Frequency '50 Hz' | New-FieldSource -Conductor -Center '0, 0, 0'
        $given = @(Test-FieldExposure -Source $feeder -Position '300 mm, 0, 0', '1 m, 0, 0')
        $texts = @('300 mm, 0, 0', '1 m, 0, 0' | Test-FieldExposure -Source $feeder)
        $rows = @(@'
Point,X,Y,Z,Position
Panel front,300 mm,0,0,
Desk,,,,"1 m, 0, 0"
Nowhere,,,,
Bare,300,0,0,
'@ | ConvertFrom-Csv | Test-FieldExposure -Source $feeder -ErrorVariable failed -ErrorAction SilentlyContinue)
        $texts.Margin | Should -Be $given.Margin
        $rows.Margin | Should -Be $given.Margin
        $rows.PointName | Should -Be @('Panel front', 'Desk') -Because 'a survey''s row names its point'
        @($texts.PointName | Where-Object { $_ }).Count | Should -Be 0 -Because 'a point given as text has no name'
        ($rows | Out-String -Width 100) | Should -Match 'Panel front\s+Caution'
        $failed.Count | Should -Be 2
        "$($failed[0])" | Should -BeLike "row 3: X: is missing: give the point as X, Y, Z or as one Position column*"
        "$($failed[1])" | Should -BeLike "row 4: X: '300' has no unit*"
        (@{ X = '300'; Y = '0'; Z = '0' } | Test-FieldExposure -Source $feeder -Unit @{ X = 'mm'; Y = 'mm'; Z = 'mm' }).Margin | Should -Be $given[0].Margin
    }

    It 'takes several points given at once to -InputObject in turn, as piped; a $null is its row''s error and the rest go on' {
        $feeder = New-FieldWaveform -Sine -Amplitude '2 kA' -Frequency '50 Hz' | New-FieldSource -Conductor -Center '0, 0, 0'
        $given = @(Test-FieldExposure -Source $feeder -Position '300 mm, 0, 0', '1 m, 0, 0')
        $row = [pscustomobject]@{ Point = 'Panel front'; X = '300 mm'; Y = '0 mm'; Z = '0 mm' }
        foreach ($run in @(
                @{ Name = 'given at once'; Out = { Test-FieldExposure -Source $feeder -InputObject $row, $null, '1 m, 0, 0' -ErrorVariable script:bad -ErrorAction SilentlyContinue } },
                @{ Name = 'piped'; Out = { $row, $null, '1 m, 0, 0' | Test-FieldExposure -Source $feeder -ErrorVariable script:bad -ErrorAction SilentlyContinue } })) {
            $script:bad = $null
            $out = @(& $run.Out)
            $out.Margin | Should -Be $given.Margin -Because $run.Name
            $out[0].PointName | Should -Be 'Panel front' -Because $run.Name
            @($script:bad).Count | Should -Be 1 -Because $run.Name
            "$($script:bad[0])" | Should -Match '^row 2: InputObject: is \$null' -Because $run.Name
        }
        @(Test-FieldExposure -Source $feeder -InputObject @()).Count | Should -Be 0
    }

    # Validates: a survey row's visitor point at 50 Hz judged at the public's level, a fifth of the workers', through Test-FieldExposure | ICNIRP 2010, Health Phys 99:818, tables 3 and 4 (1 mT and 0.2 mT, 25 to 300 Hz) | 1e-9
    It 'judges a survey row that names the public (ExposureGroup) at the public''s limits, and says when a row cannot loosen a policy for the public' {
        $feeder = New-FieldWaveform -Sine -Amplitude '2 kA' -Frequency '50 Hz' | New-FieldSource -Conductor -Center '0, 0, 0'
        $points = @'
Point,Position,ExposureGroup
Workbench,"2 m, 0, 0",
Gallery rail,"2 m, 0, 0",Public
'@ | ConvertFrom-Csv
        $out = @($points | Test-FieldExposure -Source $feeder)
        $out.ExposureGroup | Should -Be @('Occupational', 'Public')
        [math]::Abs($out[0].Margin / $out[1].Margin - 5) | Should -BeLessThan 5e-9
        $out[1].Finding | Should -Match 'general public'
        $worker = [pscustomobject]@{ Point = 'Workbench'; Position = '2 m, 0, 0'; ExposureGroup = 'Occupational' }
        $judged = $worker | Test-FieldExposure -Source $feeder -Policy @{ Name = 'Gallery rules'; ExposureGroup = 'Public' } -WarningVariable warned -WarningAction SilentlyContinue
        $judged.ExposureGroup | Should -Be 'Public'
        "$($warned[0])" | Should -BeLike "Workbench: ExposureGroup 'Occupational' is not applied: the policy 'Gallery rules' judges the public's exposure*"
    }

    It 'shows its table with the figures in SI prefixes and the verdict beside the margin' {
        $feeder = New-FieldWaveform -Sine -Amplitude '4.24 kA' -Frequency '50 Hz' | New-FieldSource -Conductor -Center '0, 0, 0'
        $table = Test-FieldExposure -Source $feeder -Position '2.5 m, 0, 0' | Out-String -Width 100
        $table | Should -Match 'Where\s+Verdict\s+Margin\s+Field\s+Limit'
        # 1 mT over 240 uT is 4.167: a margin is cut to three figures, never rounded up.
        $table | Should -Match '\(2\.5, 0, 0\) m\s+Clear\s+4\.16\s+240 µT\s+1 mT\s+50 Hz'
    }

    It 'judges a pulse by the weighted-peak method, and a faster one as worse' {
        $pulse = New-FieldWaveform -Ramp -From 0 -To '1 mT' -Duration '1 ms' | New-FieldSource -Uniform
        $faster = New-FieldWaveform -Ramp -From 0 -To '1 mT' -Duration '100 us' | New-FieldSource -Uniform
        $e = Test-FieldExposure -Source $pulse
        $e.Verdict | Should -Not -Be 'Indeterminate'
        $e.Basis | Should -Match 'weighted peak'
        ($e.Standards -join ' ') | Should -Match 'weighted-peak method'
        (Test-FieldExposure -Source $faster).Margin | Should -BeLessThan $e.Margin
    }

    It 'is Indeterminate, never a number that looks safe, for a field the method cannot resolve' {
        $mixed = @(
            (New-FieldWaveform -Sine -Amplitude '1 mT' -Frequency '50 Hz' | New-FieldSource -Uniform)
            (New-FieldWaveform -Sine -Amplitude '1 mT' -Frequency '61.3 Hz' | New-FieldSource -Uniform)
        )
        $e = Test-FieldExposure -Source $mixed -WarningVariable warned -WarningAction SilentlyContinue
        $e.Verdict | Should -Be 'Indeterminate'
        [double]::IsNaN($e.Margin) | Should -BeTrue
        ($warned -join ' ') | Should -Match 'weighted-peak method cannot be applied'
    }

    # Validates: Test-FieldExposure -Site at a visitors' station with its own policy: the public's 50 Hz reference level a fifth of the workers' | ICNIRP 2010 tables 3 and 4 (1 mT and 0.2 mT rms at 25-300 Hz) | 2e-4
    It 'judges a site''s stations each at its position by its own policy, and -Policy in their place' {
        # A site of two stations at one 50 Hz busbar: a worker's bench and a visitors' walkway (its own policy: the
        # public). The walkway's own result equals the point judged with -Public, the bench's the point judged for workers.
        $folder = Join-Path $TestDrive 'exposure-site'
        New-Item -ItemType Directory $folder | Out-Null
        $bar = "Sources = @( @{ Form = 'Busbar'; Width = '120 mm'; Thickness = '10 mm'; Axis = 'z'; Waveform = @{ Form = 'Sine'; Amplitude = '4 kA'; Frequency = '50 Hz' } } )"
        Set-Content (Join-Path $folder 'site.psd1') @"
@{
    Site = 'Exposure bay'
    Stations = @(
        @{ Name = 'Bench'; $bar; Position = '1 m, 0, 0' }
        @{ Name = 'Walkway'; $bar; Position = '2 m, 0, 0'; Policy = @{ Name = 'Tour rules'; ExposureGroup = 'Public' } }
    )
}
"@
        $site = Import-HazardSite (Join-Path $folder 'site.psd1')
        $source = $site.Find('Bench').Source
        $all = @(Test-FieldExposure -Site $site)
        ($all | ForEach-Object Station) -join ',' | Should -Be 'Bench,Walkway'
        $all[0].Margin | Should -Be (Test-FieldExposure -Source $source -Position '1 m, 0, 0').Margin
        $all[1].Margin | Should -Be (Test-FieldExposure -Source $source -Position '2 m, 0, 0' -Public).Margin
        $all[1].Finding | Should -Match 'general public limit'
        $all[0].Finding | Should -Match 'occupational limit'
        $ratio = (Test-FieldExposure -Source $source -Position '2 m, 0, 0').Margin / $all[1].Margin
        [math]::Abs($ratio / 5 - 1) | Should -BeLessThan 2e-4 -Because 'the public''s 0.2 mT is a fifth of the workers'' 1 mT at 50 Hz (ICNIRP 2010 tables 3 and 4)'

        $walkway = @(Test-FieldExposure -Site $site -Station walkway -Policy (Get-HazardPolicy) -WarningVariable replaced -WarningAction SilentlyContinue)
        $walkway.Count | Should -Be 1
        "$replaced" | Should -Be "-Policy replaces the own policy of station 'Walkway' ('Tour rules', which judges the public's exposure): it is judged by 'default (published limits)' alone."
        $walkway[0].Station | Should -Be 'Walkway'
        $walkway[0].Finding | Should -Match 'occupational limit' -Because '-Policy takes the station''s place'
        $null -eq (Test-FieldExposure -Source $source -Position '1 m, 0, 0').Station | Should -BeTrue
        { Test-FieldExposure -Site $site -Station Office -ErrorAction Stop } | Should -Throw "*'Office' is not a station of Exposure bay (its stations: Bench, Walkway)*"
    }
}

