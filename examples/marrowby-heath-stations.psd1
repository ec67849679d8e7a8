# Places at the Marrowby Heath Field Laboratory (an invented site) where conductive items are assessed.
# Each station is a uniform field whose drive follows a waveform, and optionally how long a person stays there
# (ExposureTime); values are invented for the demonstration.
@{
    Site     = 'Marrowby Heath Field Laboratory'
    Stations = @(
        @{
            Name     = 'Bay 2 pulse magnet bore'
            Form     = 'Ramp'
            From     = '0 T'
            To       = '20 T'
            Duration = '10 ms'
            Why      = 'A hand in the bore during a pulse rise.'
        }
        @{
            Name     = 'Magnet M1 bore during a quench'
            Form     = 'Ramp'
            From     = '7 T'
            To       = '0 T'
            Duration = '1.2 s'
            Why      = 'A person at the bore entrance when the magnet quenches.'
        }
        @{
            Name         = 'Induction furnace F1 coil mouth'
            Form         = 'Sine'
            Amplitude    = '1.5 mT'
            Frequency    = '9.6 kHz'
            ExposureTime = '2 min'
            Why          = 'A hand at the coil mouth for two minutes while a billet is loaded.'
        }
        @{
            Name      = 'Demagnetiser bench D3'
            Form      = 'Sine'
            Amplitude = '8 mT'
            Frequency = '50 Hz'
            Duration  = '10 min'
            Why       = 'A part is demagnetised by hand for ten minutes.'
        }
    )
}
