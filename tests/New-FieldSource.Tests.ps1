param([string] $ModulePath = (Join-Path $PSScriptRoot '../out/InductionHazard/InductionHazard.psd1'))

BeforeAll {
    Import-Module $ModulePath -Force
    $w = New-FieldWaveform -Ramp -From 0 -To '1 T' -Duration '1 s'
}

Describe 'New-FieldSource' {
    It 'makes a uniform source along <Direction>' -TestCases @(
        @{ Direction = 'x'; X = 1; Y = 0; Z = 0 }
        @{ Direction = '-y'; X = 0; Y = -1; Z = 0 }
        @{ Direction = '0,0,2'; X = 0; Y = 0; Z = 1 }
    ) {
        $s = New-FieldSource -Uniform -Waveform $w -Direction $Direction
        $s.Terms[0].Geometry.Direction.X | Should -Be $X
        $s.Terms[0].Geometry.Direction.Y | Should -Be $Y
        $s.Terms[0].Geometry.Direction.Z | Should -Be $Z
    }

    It 'takes the direction as three numbers and the waveform from the pipeline' {
        $s = $w | New-FieldSource -Uniform -Direction 3, 0, 4 -Name 'Tilted'
        $s.Name | Should -Be 'Tilted'
        $s.Terms[0].Geometry.Direction.X | Should -BeGreaterThan 0.5999999999
        $s.Terms[0].Geometry.Direction.X | Should -BeLessThan 0.6000000001
    }

    It 'refuses a zero direction' {
        { New-FieldSource -Uniform -Waveform $w -Direction 0, 0, 0 } | Should -Throw -ExpectedMessage '*Direction*non-zero*'
    }

    It 'refuses a waveform in amperes for a uniform field' {
        $amps = New-FieldWaveform -Sine -Amplitude '10 A' -Frequency 50
        { New-FieldSource -Uniform -Waveform $amps } | Should -Throw -ErrorId 'InvalidInput,InductionHazard.PowerShell.Commands.NewFieldSourceCommand'
    }

    It 'takes a direction with huge components, such as 1e200,0,0, as the axis it points along' {
        $s = New-FieldWaveform -Ramp -From 0 -To '1 T' -Duration 1 | New-FieldSource -Uniform -Direction '1e200,0,0'
        $s.Terms[0].Geometry.Direction.X | Should -Be 1
    }

    It 'makes a line conductor from a waveform piped to -Conductor alone, and a segment with -Start and -End' {
        # Two parameter sets share -Conductor; the shell must still choose between them with the waveform piped.
        $amps = New-FieldWaveform -Sine -Amplitude '2 kA' -Frequency '50 Hz'
        $line = $amps | New-FieldSource -Conductor
        $line.Terms[0].Geometry.GetType().Name | Should -Be 'LineConductor'
        $line.Terms[0].Geometry.Axis.Direction.Z | Should -Be 1
        $segment = $amps | New-FieldSource -Conductor -Start '0, 0, 0' -End '0, 0, 2 m'
        $segment.Terms[0].Geometry.GetType().Name | Should -Be 'SegmentConductor'
        $segment.Terms[0].Geometry.End.Z | Should -Be 2
    }
}
