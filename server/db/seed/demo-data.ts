// INVENTED DEMO DATA. Every company, person, address, press model and e-mail below is made up
// for the demonstration; any likeness to a real business or person is accidental.
import type { Role } from '../../../shared/schemas/roles';

export const DEMO_PASSWORD = 'demo-press-2026';
export const DEMO_COMPANY = 'Ridgeline Press Service (invented demo company)';

export const DEMO_USERS: { email: string; name: string; role: Role }[] = [
  { email: 'dana.okafor@ridgeline.example', name: 'Dana Okafor', role: 'technician' },
  { email: 'marek.lindqvist@ridgeline.example', name: 'Marek Lindqvist', role: 'technician' },
  { email: 'priya.raman@ridgeline.example', name: 'Priya Raman', role: 'technician' },
  { email: 'theo.brandt@ridgeline.example', name: 'Theo Brandt', role: 'manager' },
  { email: 'sam.quist@ridgeline.example', name: 'Sam Quist', role: 'admin' },
];

interface DemoPress {
  assetTag: string;
  model: string;
  tonnage: number;
  controlModel: string;
  sensorGeneration: string;
  controlFirmware: string;
  monitorFirmware: string;
}

interface DemoSite {
  name: string;
  address: string;
  city: string;
  presses: DemoPress[];
}

export const DEMO_CUSTOMERS: { name: string; contactName: string; contactEmail: string; contactPhone: string; sites: DemoSite[] }[] = [
  {
    name: 'Harlow Stamping Works (invented)',
    contactName: 'Ines Varga',
    contactEmail: 'maintenance@harlow-stamping.example',
    contactPhone: '+1 555 0142',
    sites: [
      {
        name: 'Eastfield Plant 2',
        address: '400 Foundry Road (invented)',
        city: 'Eastfield',
        presses: [
          { assetTag: 'HS-P07', model: 'SR-250 straight-side (invented model)', tonnage: 250, controlModel: 'PC-40 control (invented)', sensorGeneration: 'demo-gen-1', controlFirmware: '3.4', monitorFirmware: '1.9' },
          { assetTag: 'HS-P11', model: 'GF-150 gap-frame (invented model)', tonnage: 150, controlModel: 'PC-40 control (invented)', sensorGeneration: 'demo-gen-2', controlFirmware: '4.1', monitorFirmware: '2.10' },
        ],
      },
      {
        name: 'Millbrook Annex',
        address: '12 Canal Street (invented)',
        city: 'Millbrook',
        presses: [{ assetTag: 'HS-M03', model: 'GF-110 gap-frame (invented model)', tonnage: 110, controlModel: 'PC-30 control (invented)', sensorGeneration: 'demo-gen-1', controlFirmware: '3.2', monitorFirmware: '1.7' }],
      },
    ],
  },
  {
    name: 'Brightwater Metal Forming (invented)',
    contactName: 'Olu Adeyemi',
    contactEmail: 'plant.maintenance@brightwater-forming.example',
    contactPhone: '+1 555 0187',
    sites: [
      {
        name: 'Riverside Works',
        address: '88 Wharf Lane (invented)',
        city: 'Riverside',
        presses: [
          { assetTag: 'BW-401', model: 'SR-400 straight-side (invented model)', tonnage: 400, controlModel: 'PC-50 control (invented)', sensorGeneration: 'demo-gen-2', controlFirmware: '4.2', monitorFirmware: '1.9' },
          { assetTag: 'BW-402', model: 'SR-400 straight-side (invented model)', tonnage: 400, controlModel: 'PC-50 control (invented)', sensorGeneration: 'demo-gen-2', controlFirmware: '4.0', monitorFirmware: '2.3' },
          { assetTag: 'BW-160', model: 'GF-160 gap-frame (invented model)', tonnage: 160, controlModel: 'PC-40 control (invented)', sensorGeneration: 'demo-gen-1', controlFirmware: '3.4', monitorFirmware: '1.10' },
        ],
      },
    ],
  },
];
