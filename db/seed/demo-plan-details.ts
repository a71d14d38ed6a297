import type { PlanDetailsIn } from '@/lib/plan-details/schema';
import { STARTER_CHECKLIST } from '@/lib/plan-details/schema';

/** Invented plan details for the demo scenes, by title: every name, place and channel is made up. */
const checklist = (done: boolean) => STARTER_CHECKLIST.map((item) => ({ item, done }));

export const DEMO_PLAN_DETAILS: Record<string, PlanDetailsIn> = {
  'Coil transfer, Route 9 weigh station': {
    job: { customer: 'Brindlewood Coil Carriers (demo)', reference: 'HR-2026-0417', location: 'Route 9 weigh station, westbound scale exit', when: '2026-12-03T06:30' },
    load: { description: 'Steel coil on a disabled flatbed, eye horizontal, 1.6 m across', weightSource: 'estimated', weightBasis: 'Outer 1.6 m, inner 0.6 m, width 0.9 m; steel 7850 kg/m³; 5 % allowed for banding and error' },
    people: { liftDirector: 'Mitch Varga', operator: 'Dana Okafor', spotter: 'Lee Marsh', signalPerson: 'Lee Marsh' },
    communication: { handSignals: true, radioChannel: 'Ch 4 (yard)', notes: 'Stop on any lost signal.' },
    siteControl: { traffic: 'Cones along the lane line; flagger at the scale exit', laneClosed: 'Route 9 westbound right lane', policeOnScene: false },
    weather: { conditions: 'Dry, overcast, 4 °C forecast', windLimit: 11.2 },
    hazards: [
      { hazard: 'Overhead feeder 13.8 kV south of the site', control: 'Swing kept north of the truck; spotter watches the feeder side' },
      { hazard: 'Live lane beside the work', control: 'Lane closed with cones; flagger; crew stays on the shoulder side' },
    ],
    contingency: 'If the coil shifts on the sling, set it back on the disabled flatbed and re-rig.',
    emergencyPlan: 'Call 911; nearest hospital Harrow General, 6 km east on Route 9. First-aid kit in the truck cab.',
    checklist: checklist(false),
  },
  'Overturned reefer trailer, Mill Creek on-ramp': {
    job: { customer: 'Mill Creek County Sheriff (demo)', reference: 'HR-2026-0388', location: 'Mill Creek on-ramp, northbound', when: '2026-11-28T22:15' },
    load: { description: 'Refrigerated trailer on its side, product off-loaded', weightSource: 'manifest', weightBasis: 'Empty weight from the trailer plate; product removed before the lift' },
    people: { liftDirector: 'Mitch Varga', operator: 'Dana Okafor', spotter: 'Priya Raman', signalPerson: 'Priya Raman' },
    communication: { handSignals: true, radioChannel: 'Ch 2 (county tow)', notes: '' },
    siteControl: { traffic: 'Ramp closed by the sheriff; arrow board at the gore', laneClosed: 'Whole on-ramp', policeOnScene: true },
    weather: { conditions: 'Clear, light wind', windLimit: 11.2 },
    hazards: [{ hazard: 'Soft shoulder at the ramp edge', control: 'Mats under both rear pads' }],
    contingency: 'If the trailer starts to slide, stop and add a tail line to the second truck.',
    emergencyPlan: 'Call 911; sheriff on scene relays. Nearest hospital Mill Creek Regional.',
    checklist: checklist(true),
  },
};
