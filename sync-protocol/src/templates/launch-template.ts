import type { CheckTemplateFields } from '../kinds/check-template.js';
import { CAUTIONS } from './cautions.js';

/**
 * The launch check every new club starts from, system by system. Clubs edit it to their own
 * boats and procedures; the pressure ranges come from each boat's specification, not from here.
 */
export const DEFAULT_LAUNCH_TEMPLATE: CheckTemplateFields = {
  checkType: 'launch',
  name: 'Launch check',
  templateVersion: 1,
  retired: false,
  sections: [
    {
      id: 'hull', title: 'Hull and fittings', system: 'hull',
      items: [
        { id: 'hull-damage', label: 'Hull, floor and transom free of cuts, abrasion and lifting seams', kind: 'pass-fail', critical: true },
        { id: 'drain-bungs', label: 'Drain bungs in and secure', kind: 'pass-fail', critical: true },
        { id: 'handles', label: 'Handles, foot straps and capsize rope secure', kind: 'pass-fail', critical: false },
        { id: 'transom-bolts', label: 'Motor clamp screws tight and safety chain fitted', kind: 'pass-fail', critical: true },
      ],
    },
    {
      id: 'air', title: 'Air chambers and pressures', system: 'air chambers',
      items: [
        { id: 'pressure-port', label: 'Port side pontoon pressure', kind: 'reading', critical: true, unit: 'kPa', chamberId: 'port' },
        { id: 'pressure-starboard', label: 'Starboard side pontoon pressure', kind: 'reading', critical: true, unit: 'kPa', chamberId: 'starboard' },
        { id: 'pressure-bow', label: 'Bow chamber pressure', kind: 'reading', critical: true, unit: 'kPa', chamberId: 'bow' },
        { id: 'valve-caps', label: 'All three valve caps fitted', kind: 'pass-fail', critical: false },
      ],
    },
    {
      id: 'fuel', title: 'Fuel system', system: 'fuel',
      items: [
        { id: 'bladder-clips', label: 'Fuel bladder held to the floor at all four points, clips facing down', kind: 'pass-fail', critical: true, caution: CAUTIONS.fuel },
        { id: 'fuel-line', label: 'Fuel line and primer bulb free of cracks and leaks; connector clicks home', kind: 'pass-fail', critical: true },
        { id: 'fuel-level', label: 'Enough premixed fuel for the session', kind: 'pass-fail', critical: false },
      ],
    },
    {
      id: 'motor', title: 'Motor and its test run', system: 'motor',
      items: [
        { id: 'propeller', label: 'Propeller, lock nut and split pin sound; propeller guard fitted if the club uses one', kind: 'pass-fail', critical: true },
        { id: 'cowling', label: 'Cowling latched', kind: 'pass-fail', critical: false },
        { id: 'kill-cord', label: 'Kill cord present and stops the motor', kind: 'pass-fail', critical: true, caution: CAUTIONS.killCord },
        { id: 'test-run', label: 'Test run in a tub: starts, idles in neutral, tell-tale shows cooling water', kind: 'pass-fail', critical: true, caution: CAUTIONS.testRun },
        { id: 'tiller-throttle', label: 'Tiller, throttle and gear shift move freely', kind: 'pass-fail', critical: true },
      ],
    },
    {
      id: 'gear', title: 'Carried rescue equipment', system: 'rescue gear',
      items: [
        { id: 'rescue-tube', label: 'Rescue tube', kind: 'count', critical: false, required: 1 },
        { id: 'paddles', label: 'Paddles', kind: 'count', critical: false, required: 2 },
        { id: 'tow-rope', label: 'Tow rope', kind: 'count', critical: false, required: 1 },
        { id: 'knife', label: 'Knife', kind: 'count', critical: false, required: 1 },
        { id: 'whistle', label: 'Whistle', kind: 'count', critical: false, required: 1 },
      ],
    },
    {
      id: 'crew-kit', title: 'Life jackets and radio', system: 'crew safety',
      items: [
        { id: 'life-jackets', label: 'Life jackets sized for driver and crew', kind: 'count', critical: true, required: 2 },
        { id: 'radio', label: 'Waterproof radio charged and checked with the tower', kind: 'pass-fail', critical: true },
      ],
    },
  ],
};
