import type { AreaDef } from '../../../framework/types';

export const area: AreaDef = {
	code: 'MDA',
	name: 'Manual drivetrain and axles',
	tasks: [
		{
			code: 'MDA-01',
			title: 'Replace a clutch disc, pressure plate and release bearing',
			description:
				'Remove the transmission, renew the clutch parts, check or resurface the flywheel and refit everything to specification. The job ends with a road test of engagement and slip.',
			tier: 1,
			requiredLevel: 3,
			minHours: 10,
			checklist: [
				{ text: 'Disconnect the battery, then raise and support the vehicle', safety: true },
				{
					text: 'Support the engine and lower the transmission on a jack with the unit strapped on',
					safety: true
				},
				{
					text: 'Loosen the pressure plate bolts a little at a time in a crisscross pattern',
					safety: true
				},
				{ text: 'Inspect the flywheel for heat cracks, glazing and runout; resurface or replace' },
				{ text: 'Inspect the release fork, pivot, input shaft splines and pilot bearing' },
				{ text: 'Find and repair any oil leak that contaminated the old disc' },
				{ text: 'Centre the new disc with an alignment tool, correct side to the flywheel' },
				{
					text: 'Torque the pressure plate bolts in steps in a crisscross pattern to specification',
					safety: true
				},
				{
					text: 'Refit the transmission without letting it hang on the input shaft, and torque the bolts',
					safety: true
				},
				{ text: 'Bleed or adjust the clutch and road test for engagement and slip', safety: true }
			],
			specs: [
				{ label: 'Flywheel runout', value: 0.1, unit: 'mm', limit: 'maximum' },
				{ label: 'Pressure plate bolt torque', value: 25, unit: 'N·m', limit: 'nominal' },
				{ label: 'Transmission-to-engine bolt torque', value: 48, unit: 'N·m', limit: 'nominal' },
				{ label: 'Disc rivet head depth below lining', value: 0.3, unit: 'mm', limit: 'minimum' }
			],
			tools: [
				'Transmission jack',
				'Engine support bar',
				'Clutch alignment tool',
				'Dial indicator',
				'Torque wrench'
			],
			cautions: [
				'A transmission is heavy: strap it to the jack and keep people clear.',
				'Pressure plate springs are under load; loosen bolts evenly.',
				'Clutch dust is a health hazard: clean it wet, never with compressed air.'
			],
			serviceInfo: ['repair procedure', 'specifications', 'safety data sheet'],
			questions: [
				{
					prompt: 'Why loosen the pressure plate bolts a little at a time in a crisscross pattern?',
					options: [
						{ text: 'The bolts are left-hand thread', correct: false },
						{
							text: 'The spring pressure is released evenly, so the cover does not distort or spring off',
							correct: true
						},
						{ text: 'To keep the flywheel balanced', correct: false }
					],
					explanation:
						'Releasing one bolt fully puts all the spring load on the others and can warp the cover.'
				},
				{
					prompt: 'What is the purpose of the clutch alignment tool?',
					options: [
						{
							text: 'To centre the disc hub on the pilot bearing so the input shaft can enter',
							correct: true
						},
						{ text: 'To set pressure plate clamping force', correct: false },
						{ text: 'To measure flywheel runout', correct: false }
					],
					explanation:
						'A disc off centre stops the transmission sliding home and tempts the fitter to force it.'
				},
				{
					prompt: 'Why must the transmission not hang on the input shaft during refitting?',
					options: [
						{ text: 'The clutch will not engage until adjusted', correct: false },
						{ text: 'It makes the bell housing bolts harder to start', correct: false },
						{
							text: 'Its weight bends the disc hub and damages the splines and pilot bearing',
							correct: true
						}
					],
					explanation:
						'The unit must stay supported and aligned until the bell housing is fully seated.'
				},
				{
					prompt:
						'The old disc is soaked in oil. What must happen before the new clutch is fitted?',
					options: [
						{ text: 'Wash the new disc in solvent', correct: false },
						{ text: 'Fit a thicker disc', correct: false },
						{
							text: 'Find and repair the leak, such as a crankshaft rear seal or input shaft seal',
							correct: true
						},
						{ text: 'Nothing, the new disc will not absorb oil', correct: false }
					],
					explanation: 'Oil on the new lining causes slip and chatter within a short time.'
				},
				{
					prompt: 'Which flywheel findings mean it must be resurfaced or replaced? Choose two.',
					options: [
						{ text: 'Heat cracks and blue hard spots on the face', correct: true },
						{ text: 'Runout above the maximum specification', correct: true },
						{ text: 'A clean, flat, lightly worn face', correct: false },
						{ text: 'Dust in the bolt holes', correct: false }
					],
					explanation:
						'A damaged or wobbling face gives chatter and slip even with a new disc and pressure plate.'
				}
			]
		},
		{
			code: 'MDA-02',
			title: 'Bleed a hydraulic clutch system',
			description:
				'Remove air from the clutch master and slave cylinders and lines, and confirm that the clutch releases fully.',
			tier: 1,
			requiredLevel: 4,
			minHours: 1.5,
			checklist: [
				{ text: 'Confirm the fluid type and whether the reservoir is shared with the brakes' },
				{ text: 'Cover painted surfaces near the reservoir' },
				{ text: 'Raise and support the vehicle if the bleeder is underneath', safety: true },
				{ text: 'Bleed at the slave cylinder, keeping the reservoir above the minimum mark' },
				{ text: 'Follow the special procedure for a concentric slave cylinder where specified' },
				{ text: 'Torque the bleeder screw and top up the reservoir' },
				{ text: 'Check pedal feel, free play and engagement point' },
				{
					text: 'With the parking brake on, check that gears select without grinding with the engine running',
					safety: true
				}
			],
			specs: [
				{ label: 'Bleeder screw torque', value: 8, unit: 'N·m', limit: 'nominal' },
				{ label: 'Clutch pedal free play, lower limit', value: 5, unit: 'mm', limit: 'minimum' },
				{ label: 'Clutch pedal free play, upper limit', value: 15, unit: 'mm', limit: 'maximum' }
			],
			tools: ['Bleed hose and bottle', 'Vacuum or pressure bleeder', 'Rule', 'Wrench set'],
			cautions: [
				'Brake fluid damages paint and irritates skin and eyes.',
				'Set the parking brake before testing gear selection with the engine running.'
			],
			serviceInfo: ['repair procedure', 'specifications'],
			questions: [
				{
					prompt: 'Which symptoms point to air in the clutch hydraulics? Choose two.',
					options: [
						{ text: 'Clutch slip under load', correct: false },
						{ text: 'A whine in fifth gear only', correct: false },
						{ text: 'A spongy pedal', correct: true },
						{ text: 'Gears grinding because the clutch does not fully release', correct: true }
					],
					explanation:
						'Air compresses, so the slave cylinder does not travel far enough to release the clutch.'
				},
				{
					prompt: 'Why should the slave cylinder bleeder be at its highest point during bleeding?',
					options: [
						{ text: 'Air rises and collects at the highest point', correct: true },
						{ text: 'Fluid flows faster upward', correct: false },
						{ text: 'It keeps the fork in place', correct: false }
					],
					explanation: 'If the bleeder points down, air stays trapped at the top of the cylinder.'
				},
				{
					prompt: 'The clutch shares a reservoir with the brakes. Why watch the level closely?',
					options: [
						{ text: 'The brakes will bleed at the same time', correct: false },
						{ text: 'It does not matter for the clutch', correct: false },
						{
							text: 'A dry reservoir draws air into the clutch line and may lower the brake supply',
							correct: true
						}
					],
					explanation:
						'Running the shared reservoir low can affect both systems and means bleeding again.'
				},
				{
					prompt:
						'The pedal slowly sinks while held down and there is no external leak. What is likely?',
					options: [
						{ text: 'Too much pedal free play', correct: false },
						{ text: 'Internal leakage in the clutch master cylinder', correct: true },
						{ text: 'A worn clutch disc', correct: false }
					],
					explanation:
						'Fluid bypassing the master cylinder seal lets the pedal sink without visible loss.'
				},
				{
					prompt: 'How do you confirm the clutch is fully releasing after bleeding?',
					options: [
						{ text: 'The reservoir level stays the same', correct: false },
						{
							text: 'Engine running, pedal down for a few seconds, then Reverse selects without grinding',
							correct: true
						},
						{ text: 'The pedal returns to the top', correct: false }
					],
					explanation:
						'Reverse usually has no synchroniser, so it grinds if the disc is still turning.'
				}
			]
		},
		{
			code: 'MDA-03',
			title: 'Replace a front drive axle and torque the hub nut',
			description:
				'Remove and replace a constant-velocity drive axle without damaging the joints, seals or suspension, and tighten the hub nut to specification.',
			tier: 1,
			requiredLevel: 4,
			minHours: 3,
			checklist: [
				{ text: 'Loosen the hub nut with the wheel on the ground or the brakes applied' },
				{ text: 'Raise and support the vehicle', safety: true },
				{
					text: 'Separate the lower ball joint without tearing boots or straining the brake hose and sensor lead',
					safety: true
				},
				{
					text: 'Remove the axle by levering at the inner joint housing, not by pulling the shaft'
				},
				{ text: 'Compare the new axle with the old one for length, splines and tone ring' },
				{ text: 'Fit the axle with a new circlip and confirm it is locked into the differential' },
				{ text: 'Torque suspension fasteners to specification', safety: true },
				{
					text: 'Torque the new hub nut to specification by hand, not with an impact wrench, and lock it',
					safety: true
				},
				{ text: 'Top up the transaxle fluid and torque the wheel nuts', safety: true },
				{ text: 'Road test for clicks, vibration and leaks', safety: true }
			],
			specs: [
				{ label: 'Drive axle hub nut torque', value: 177, unit: 'lbf·ft', limit: 'nominal' },
				{ label: 'Ball joint pinch bolt torque', value: 44, unit: 'lbf·ft', limit: 'nominal' },
				{ label: 'Wheel nut torque', value: 80, unit: 'lbf·ft', limit: 'nominal' }
			],
			tools: ['Breaker bar', 'Axle puller or pry bar', 'Ball joint separator', 'Torque wrench'],
			cautions: [
				'Support the vehicle on stands or a hoist before removing a wheel.',
				'Do not let the vehicle rest on its wheels with the hub nut off; the bearing can be damaged.',
				'Do not let the axle hang by its inner joint or the knuckle hang by the brake hose.'
			],
			serviceInfo: ['repair procedure', 'specifications'],
			questions: [
				{
					prompt: 'Why is the hub nut tightened with a torque wrench rather than an impact wrench?',
					options: [
						{
							text: 'Impacts can damage the bearing and give no reliable final torque',
							correct: true
						},
						{ text: 'Impact wrenches cannot reach that torque', correct: false },
						{ text: 'The nut is left-hand thread', correct: false }
					],
					explanation:
						'The hub nut clamps the bearing; hammering it can brinell the races and overshoot the torque.'
				},
				{
					prompt: 'Why lever on the inner joint housing rather than pull the axle shaft?',
					options: [
						{ text: 'The shaft is too hot to hold', correct: false },
						{ text: 'It prevents the wheel from turning', correct: false },
						{ text: 'Pulling the shaft can pull the inner joint apart', correct: true }
					],
					explanation:
						'The plunging inner joint is not designed to hold the shaft in tension and can separate.'
				},
				{
					prompt:
						'How do you confirm the circlip has locked the inner joint into the differential?',
					options: [
						{ text: 'Look for fluid at the seal', correct: false },
						{ text: 'Turn the wheel and listen', correct: false },
						{ text: 'Pull the inner housing by hand; it should not come out', correct: true }
					],
					explanation:
						'An unlocked axle can walk out of the differential, leak fluid and lose drive.'
				},
				{
					prompt:
						'Why is the hub nut loosened before the vehicle is raised, or with the brakes applied?',
					options: [
						{ text: 'It stops the tyre going flat', correct: false },
						{
							text: 'The hub must be held still to break the high torque without loading stands',
							correct: true
						},
						{ text: 'The nut only loosens when warm', correct: false }
					],
					explanation:
						'Heaving on a breaker bar with the vehicle on stands can shift it off the stands.'
				},
				{
					prompt: 'Why is a new hub nut often specified?',
					options: [
						{
							text: 'The old nut has been staked or has a deformed locking collar that will not hold again',
							correct: true
						},
						{ text: 'The old nut is the wrong size for the new axle', correct: false },
						{ text: 'New nuts need less torque', correct: false }
					],
					explanation: 'The locking feature of a one-time nut is weakened once used.'
				}
			]
		},
		{
			code: 'MDA-04',
			title: 'Replace a front wheel bearing hub assembly',
			description:
				'Confirm a worn wheel bearing, then replace a bolt-on hub and bearing assembly, refit the brake parts and confirm the wheel-speed signal.',
			tier: 1,
			requiredLevel: 4,
			minHours: 3,
			checklist: [
				{ text: 'Confirm bearing noise on a road test and check play and roughness on the hoist' },
				{ text: 'Raise and support the vehicle', safety: true },
				{ text: 'Remove the caliper and hang it with a hook, never by its hose', safety: true },
				{ text: 'Remove the rotor, sensor and hub; clean the knuckle mounting face of rust' },
				{ text: 'Fit the new hub with the sensor and encoder kept free of debris' },
				{ text: 'Torque the hub bolts and hub nut to specification', safety: true },
				{ text: 'Measure hub axial play with a dial indicator' },
				{
					text: 'Refit the brakes, torque the fasteners and pump the pedal until firm',
					safety: true
				},
				{ text: 'Check wheel-speed data and road test for noise', safety: true }
			],
			specs: [
				{ label: 'Hub mounting bolt torque', value: 80, unit: 'N·m', limit: 'nominal' },
				{ label: 'Drive axle hub nut torque', value: 240, unit: 'N·m', limit: 'nominal' },
				{ label: 'Hub axial play', value: 0.05, unit: 'mm', limit: 'maximum' },
				{ label: 'Caliper bracket bolt torque', value: 110, unit: 'N·m', limit: 'nominal' }
			],
			tools: ['Dial indicator', 'Caliper hook', 'Wire brush', 'Scan tool', 'Torque wrench'],
			cautions: [
				'Support the vehicle on stands or a hoist before removing a wheel.',
				'Never hang a caliper by its hose.',
				'Pump the brake pedal before moving the vehicle.'
			],
			serviceInfo: ['repair procedure', 'specifications', 'diagnostic procedure'],
			questions: [
				{
					prompt:
						'A growl gets louder when the car sweeps left and quieter when it sweeps right. Which bearing is most likely worn?',
					options: [
						{ text: 'The right-side bearing', correct: true },
						{ text: 'The left-side bearing', correct: false },
						{ text: 'Both bearings equally', correct: false }
					],
					explanation:
						'In a left turn the weight moves onto the right-side wheels, which loads that bearing and makes it louder.'
				},
				{
					prompt: 'Why clean rust from the knuckle mounting face before fitting the new hub?',
					options: [
						{ text: 'So the ABS sensor fits', correct: false },
						{ text: 'It makes the bolts easier to torque', correct: false },
						{
							text: 'Scale tilts the hub, causing runout and early bearing and brake problems',
							correct: true
						}
					],
					explanation: 'The hub must sit flat for the rotor to run true.'
				},
				{
					prompt: 'Why must the hub and bearing never be hammered into place?',
					options: [
						{ text: 'Hammering is fine if a soft mallet is used', correct: false },
						{
							text: 'Impacts dent the races and can damage the encoder, causing noise and sensor faults',
							correct: true
						},
						{ text: 'It voids the repair order', correct: false }
					],
					explanation: 'Shock loads dent the races and the bearing soon becomes noisy.'
				},
				{
					prompt: 'Why keep the magnetic encoder ring free of metal debris?',
					options: [
						{ text: 'It changes the hub torque', correct: false },
						{
							text: 'Debris distorts the signal and causes wheel-speed and ABS faults',
							correct: true
						},
						{ text: 'It makes the bearing run hot', correct: false }
					],
					explanation:
						'The sensor reads the magnetic poles of the ring, so filings stuck to it spoil the signal.'
				},
				{
					prompt: 'Axial play measures 0.12 mm against a 0.05 mm maximum. What should you do?',
					options: [
						{ text: 'Check the hub nut torque; if correct, the hub is faulty', correct: true },
						{ text: 'Accept it, a new bearing settles in', correct: false },
						{ text: 'Add grease to the bearing', correct: false }
					],
					explanation:
						'A hub bearing relies on correct clamp; too much play with correct torque means a faulty part.'
				}
			]
		},
		{
			code: 'MDA-05',
			title: 'Service rear differential fluid',
			description:
				'Drain and refill a drive axle with the specified gear oil, adding friction modifier where required, and set the level correctly.',
			tier: 1,
			requiredLevel: 4,
			minHours: 1.5,
			checklist: [
				{ text: 'Confirm fluid type, viscosity, capacity and any friction modifier needed' },
				{ text: 'Raise the vehicle level on the hoist and support it', safety: true },
				{ text: 'Remove the fill plug before the drain plug', safety: true },
				{ text: 'Drain the fluid and inspect it and the magnet for metal or water' },
				{ text: 'Fit the drain plug with a new washer and torque it', safety: true },
				{ text: 'Fill to the bottom of the fill hole with the vehicle level' },
				{ text: 'Fit the fill plug, torque it and check the breather is clear' },
				{ text: 'Record the fluid used and check for leaks' }
			],
			specs: [
				{ label: 'Axle fluid capacity', value: 1.6, unit: 'L', limit: 'nominal' },
				{ label: 'Fluid level below bottom of fill hole', value: 5, unit: 'mm', limit: 'maximum' },
				{ label: 'Drain and fill plug torque', value: 40, unit: 'N·m', limit: 'nominal' }
			],
			tools: ['Drain pan', 'Fluid pump', 'Socket or square drive set', 'Torque wrench'],
			cautions: [
				'Gear oil can be hot after a drive and has a strong smell; work with good ventilation.',
				'Clean up spills at once; oil on the floor causes slips.'
			],
			serviceInfo: ['repair procedure', 'specifications', 'maintenance schedule'],
			questions: [
				{
					prompt: 'Why remove the fill plug before the drain plug?',
					options: [
						{ text: 'It helps the oil drain faster only', correct: false },
						{ text: 'It prevents the breather from blocking', correct: false },
						{
							text: 'If the fill plug is seized, you have not drained a unit you cannot refill',
							correct: true
						}
					],
					explanation: 'A drained axle that cannot be refilled leaves the vehicle stuck in the bay.'
				},
				{
					prompt: 'What is the correct fluid level for most drive axles?',
					options: [
						{ text: 'Half way up the housing', correct: false },
						{ text: 'To the top of the breather', correct: false },
						{
							text: 'At or just below the bottom of the fill hole with the vehicle level',
							correct: true
						}
					],
					explanation: 'The fill hole is placed at the correct level, so the vehicle must be level.'
				},
				{
					prompt:
						'A limited-slip axle chatters on tight turns after a fluid change. What is likely?',
					options: [
						{ text: 'The tyres are new', correct: false },
						{ text: 'Friction modifier was not added or the wrong fluid was used', correct: true },
						{ text: 'The level is slightly high', correct: false }
					],
					explanation:
						'Limited-slip clutches need the right friction properties to slip smoothly in turns.'
				},
				{
					prompt: 'The drained oil is milky. What should you check?',
					options: [
						{ text: 'The breather and seals for water entry', correct: true },
						{ text: 'Nothing, milky oil is normal', correct: false },
						{ text: 'The brake fluid level', correct: false }
					],
					explanation:
						'Milky oil has water in it, from deep water crossings or a blocked breather, which causes rust and wear.'
				},
				{
					prompt: 'Why is the axle breather checked during the fluid service?',
					options: [
						{
							text: 'A blocked breather lets pressure build as the axle warms and pushes oil past the seals',
							correct: true
						},
						{ text: 'The breather is where the level is read', correct: false },
						{ text: 'It lets the fluid drain faster', correct: false }
					],
					explanation:
						'Axle oil expands when hot, and without a clear breather the pressure forces it out at the pinion and axle seals.'
				}
			]
		},
		{
			code: 'MDA-06',
			title: 'Check and change manual transmission fluid',
			description:
				'Check the level at the fill hole and, when due, drain and refill a manual transmission or transaxle with the specified fluid.',
			tier: 1,
			requiredLevel: 4,
			minHours: 1,
			checklist: [
				{ text: 'Confirm the fluid type and capacity for this unit' },
				{ text: 'Raise the vehicle level on the hoist and support it', safety: true },
				{ text: 'Clean around the fill plug and remove it first', safety: true },
				{ text: 'Check the level at the bottom of the fill hole' },
				{ text: 'If due, drain the fluid and inspect it and the magnet' },
				{ text: 'Refill with the specified fluid to the bottom of the fill hole' },
				{ text: 'Fit new washers and torque both plugs to specification', safety: true },
				{ text: 'Check for leaks and record the work on the repair order' }
			],
			specs: [
				{ label: 'Transmission fluid capacity', value: 2, unit: 'L', limit: 'nominal' },
				{ label: 'Drain and fill plug torque', value: 40, unit: 'N·m', limit: 'nominal' }
			],
			tools: ['Drain pan', 'Fluid pump', 'Socket set', 'Torque wrench'],
			cautions: [
				'Fluid can be hot after a drive; wear gloves.',
				'Clean up spills at once; oil on the floor causes slips.'
			],
			serviceInfo: ['repair procedure', 'specifications', 'maintenance schedule'],
			questions: [
				{
					prompt: 'Why must the specified fluid be used in a manual transmission?',
					options: [
						{ text: 'All gear oils behave the same', correct: false },
						{ text: 'It only affects the colour', correct: false },
						{
							text: 'Synchronisers need the right friction to match gear speeds smoothly',
							correct: true
						}
					],
					explanation: 'Wrong fluid can cause hard shifting, grinding and synchroniser wear.'
				},
				{
					prompt: 'Why must the vehicle be level when checking the level?',
					options: [
						{ text: 'It is only needed for automatics', correct: false },
						{ text: 'A tilted unit gives a false level at the fill hole', correct: true },
						{ text: 'The plug will not come out otherwise', correct: false }
					],
					explanation: 'The fill hole marks the correct level only when the case is level.'
				},
				{
					prompt:
						'You drained the unit and then the fill plug would not move. Which step was missed?',
					options: [
						{ text: 'Checking the clutch fluid', correct: false },
						{ text: 'Loosening the fill plug before removing the drain plug', correct: true },
						{ text: 'Warming the fluid', correct: false }
					],
					explanation: 'Always prove the fill plug will come out before draining anything.'
				},
				{
					prompt: 'Which findings in the drained fluid need reporting? Choose two.',
					options: [
						{ text: 'Chunks of metal on the magnet', correct: true },
						{ text: 'Brass-coloured glitter throughout', correct: true },
						{ text: 'A thin film of fine grey paste', correct: false },
						{ text: 'Fluid of the normal colour', correct: false }
					],
					explanation:
						'Chunks and brass particles point to gear and synchroniser wear that needs diagnosis.'
				},
				{
					prompt: 'Why are new sealing washers fitted on the plugs?',
					options: [
						{ text: 'They change the fluid level', correct: false },
						{ text: 'They lower the torque needed', correct: false },
						{ text: 'Used washers are flattened and may leak', correct: true }
					],
					explanation: 'A crush washer seals by deforming once.'
				}
			]
		},
		{
			code: 'MDA-07',
			title: 'Inspect a driveshaft and universal joints',
			description:
				'Check the driveshaft, universal joints, slip yoke and centre bearing for wear, damage and runout.',
			tier: 2,
			requiredLevel: 3,
			minHours: 1.5,
			checklist: [
				{
					text: 'Raise and support the vehicle, chock the wheels and select neutral',
					safety: true
				},
				{ text: 'Twist each joint against its yoke to check for play' },
				{ text: 'Look for rust dust at bearing caps and missing grease' },
				{ text: 'Check slip yoke spline play and its seal' },
				{ text: 'Check the centre bearing rubber and mounting' },
				{ text: 'Check for dents and missing balance weights and measure runout' },
				{ text: 'Check flange bolt torque', safety: true }
			],
			specs: [
				{ label: 'Driveshaft runout', value: 0.4, unit: 'mm', limit: 'maximum' },
				{ label: 'Flange bolt torque', value: 80, unit: 'N·m', limit: 'nominal' }
			],
			tools: ['Dial indicator with magnetic base', 'Pry bar', 'Inspection light', 'Torque wrench'],
			cautions: [
				'Chock any wheels left on the ground before selecting neutral.',
				'Keep hands clear of the joints while the shaft is being turned.'
			],
			serviceInfo: ['diagnostic procedure', 'specifications'],
			questions: [
				{
					prompt: 'What does rust-coloured dust at a universal joint cap usually mean?',
					options: [
						{ text: 'Normal road dirt', correct: false },
						{ text: 'The joint has been greased', correct: false },
						{ text: 'The needle bearings are dry and wearing', correct: true }
					],
					explanation: 'Dry bearings wear and shed rust-coloured debris.'
				},
				{
					prompt: 'Which symptoms point to a worn universal joint? Choose two.',
					options: [
						{ text: 'A vibration that rises with road speed', correct: true },
						{ text: 'A squeal when braking', correct: false },
						{ text: 'A hard clutch pedal', correct: false },
						{ text: 'A clunk when changing from Drive to Reverse', correct: true }
					],
					explanation:
						'Play in the joint causes a clunk on torque reversal and a vibration at speed.'
				}
			]
		},
		{
			code: 'MDA-08',
			title: 'Replace a universal joint',
			description:
				'Remove the driveshaft, press out a worn joint, fit a new one and refit the shaft in its original position.',
			tier: 2,
			requiredLevel: 3,
			minHours: 3,
			checklist: [
				{ text: 'Mark the shaft to the flange and yokes before removal' },
				{ text: 'Support the shaft when unbolting and plug the transmission output', safety: true },
				{ text: 'Press out the caps in a vice or press without damaging the tube' },
				{ text: 'Fit the new joint with all needle rollers in place' },
				{ text: 'Fit the clips and check the joint moves freely without binding' },
				{ text: 'Grease until fresh grease purges from all four caps' },
				{ text: 'Refit to the marks and torque the bolts to specification', safety: true },
				{ text: 'Road test for vibration', safety: true }
			],
			specs: [
				{ label: 'Flange bolt torque', value: 80, unit: 'N·m', limit: 'nominal' },
				{ label: 'Strap bolt torque', value: 20, unit: 'N·m', limit: 'nominal' }
			],
			tools: ['Vice or press', 'Sockets for pressing', 'Grease gun', 'Torque wrench'],
			cautions: [
				'A driveshaft is heavy and can drop; support it.',
				'Wear eye protection when pressing joints.'
			],
			serviceInfo: ['repair procedure', 'specifications'],
			questions: [
				{
					prompt: 'Why mark the driveshaft to the flange before removal?',
					options: [
						{ text: 'To keep the original balance and joint alignment', correct: true },
						{ text: 'The bolts are different lengths', correct: false },
						{ text: 'It is only for the records', correct: false }
					],
					explanation: 'Refitting in a different position can cause vibration.'
				},
				{
					prompt: 'A new joint feels tight after fitting. What is a likely cause?',
					options: [
						{ text: 'A needle roller has fallen over inside a cap', correct: true },
						{ text: 'Too much grease', correct: false },
						{ text: 'The shaft is too short', correct: false }
					],
					explanation: 'A dropped roller binds the joint and destroys it quickly.'
				}
			]
		},
		{
			code: 'MDA-09',
			title: 'Service transfer case fluid',
			description:
				'Drain and refill a transfer case with its specified fluid and set the level at the fill hole.',
			tier: 2,
			requiredLevel: 3,
			minHours: 1.5,
			checklist: [
				{ text: 'Confirm the fluid type and capacity; it often differs from axle oil' },
				{ text: 'Raise the vehicle level and support it', safety: true },
				{ text: 'Remove the fill plug before the drain plug', safety: true },
				{ text: 'Drain and inspect the fluid and magnet' },
				{ text: 'Refill to the bottom of the fill hole' },
				{ text: 'Torque the plugs with new washers', safety: true },
				{ text: 'Check four-wheel-drive engagement and the indicator on a road test', safety: true }
			],
			specs: [
				{ label: 'Transfer case capacity', value: 1.4, unit: 'L', limit: 'nominal' },
				{ label: 'Drain and fill plug torque', value: 30, unit: 'N·m', limit: 'nominal' }
			],
			tools: ['Drain pan', 'Fluid pump', 'Socket set', 'Torque wrench'],
			cautions: ['Fluid can be hot after driving; wear gloves.'],
			serviceInfo: ['repair procedure', 'specifications', 'maintenance schedule'],
			questions: [
				{
					prompt: 'Why check service information for the transfer case fluid type?',
					options: [
						{ text: 'All transfer cases use axle gear oil', correct: false },
						{ text: 'It only affects the capacity', correct: false },
						{
							text: 'Many use a special fluid, and the wrong one can wear the chain or clutch pack',
							correct: true
						}
					],
					explanation: 'Fluids differ by design, and the wrong one shortens the life of the unit.'
				},
				{
					prompt: 'How is the transfer case level normally set?',
					options: [
						{ text: 'By adding the full listed capacity regardless', correct: false },
						{ text: 'To the bottom of the fill hole with the vehicle level', correct: true },
						{ text: 'With a dipstick at operating temperature', correct: false }
					],
					explanation: 'The fill hole gives the level; capacity is only a guide.'
				}
			]
		},
		{
			code: 'MDA-10',
			title: 'Diagnose clutch slip, drag, chatter and noise',
			description:
				'Verify the concern and use simple tests to tell clutch faults from hydraulic, mount and transmission faults.',
			tier: 2,
			requiredLevel: 3,
			minHours: 3,
			checklist: [
				{ text: 'Verify the concern with the customer description and a road test', safety: true },
				{ text: 'Check pedal free play, fluid level and leaks' },
				{ text: 'Test for slip by accelerating in a high gear from low speed on the road' },
				{
					text: 'Test for drag by selecting Reverse after a pause with the pedal down',
					safety: true
				},
				{ text: 'Note noises with the pedal up and with the pedal down' },
				{ text: 'Inspect engine and transmission mounts for chatter causes' },
				{ text: 'Record the diagnosis and recommended repair' }
			],
			specs: [
				{ label: 'Clutch pedal free play, lower limit', value: 5, unit: 'mm', limit: 'minimum' },
				{ label: 'Clutch pedal free play, upper limit', value: 15, unit: 'mm', limit: 'maximum' }
			],
			tools: ['Rule', 'Inspection light', 'Stethoscope'],
			cautions: [
				'Test on a safe, quiet route and obey traffic law.',
				'Do not hold a clutch slip test long; heat damages the clutch.'
			],
			serviceInfo: ['diagnostic procedure'],
			questions: [
				{
					prompt:
						'A noise is heard in neutral with the pedal released and stops when the pedal is pressed. What is likely?',
					options: [
						{ text: 'The pilot bearing', correct: false },
						{ text: 'A transmission input shaft bearing', correct: true },
						{ text: 'The release bearing', correct: false }
					],
					explanation:
						'With the pedal pressed the input shaft stops turning, so a noise that stops then comes from the input shaft.'
				},
				{
					prompt: 'Which can cause clutch slip? Choose two.',
					options: [
						{ text: 'Too much pedal free play', correct: false },
						{ text: 'Oil on the disc lining', correct: true },
						{ text: 'No pedal free play holding the release bearing on', correct: true },
						{ text: 'Air in the hydraulic line', correct: false }
					],
					explanation:
						'Oil reduces friction and a preloaded release bearing reduces clamping force, both causing slip.'
				},
				{
					prompt: 'A noise appears only when the pedal is pressed. Which part is likely?',
					options: [
						{ text: 'The differential', correct: false },
						{ text: 'The input shaft bearing', correct: false },
						{ text: 'The release bearing', correct: true }
					],
					explanation: 'The release bearing only turns under load when the pedal is pressed.'
				}
			]
		},
		{
			code: 'MDA-11',
			title: 'Inspect drive axle constant-velocity joints and boots',
			description:
				'Inspect boots, clamps and joints for damage and wear and link noises on a road test to the inner or outer joint.',
			tier: 2,
			requiredLevel: 4,
			minHours: 1,
			checklist: [
				{ text: 'Raise and support the vehicle', safety: true },
				{ text: 'Turn the wheels lock to lock and inspect boots for splits and thrown grease' },
				{ text: 'Check clamps for security' },
				{ text: 'Check the joints for play by hand' },
				{ text: 'Road test for clicks in tight turns and shudder on acceleration', safety: true },
				{ text: 'Record findings and recommend boot or axle replacement' }
			],
			specs: [],
			tools: ['Inspection light', 'Hoist'],
			cautions: ['Support the vehicle on stands or a hoist before working under it.'],
			serviceInfo: ['diagnostic procedure'],
			questions: [
				{
					prompt:
						'A clicking noise appears in tight turns under power. Which joint is likely worn?',
					options: [
						{ text: 'The inner plunging joint', correct: false },
						{ text: 'The wheel bearing', correct: false },
						{ text: 'The outer constant-velocity joint', correct: true }
					],
					explanation:
						'The outer joint works at sharp angles in tight turns, where worn races click.'
				},
				{
					prompt: 'A boot is split but the joint is quiet and the grease is clean. What is best?',
					options: [
						{ text: 'Pack the joint with extra grease', correct: false },
						{ text: 'Replace the boot or axle soon, before dirt ruins the joint', correct: true },
						{ text: 'Leave it until the joint makes noise', correct: false }
					],
					explanation: 'Once dirt and water enter, the joint wears quickly.'
				},
				{
					prompt: 'A shudder on hard acceleration from a stop points most often to which part?',
					options: [
						{ text: 'A worn inner plunging joint', correct: true },
						{ text: 'A split outer boot only', correct: false },
						{ text: 'Low tyre pressure', correct: false }
					],
					explanation:
						'The inner joint plunges under torque, and wear shows as shudder on acceleration.'
				}
			]
		},
		{
			code: 'MDA-12',
			title: 'Diagnose differential noise and measure ring gear backlash',
			description:
				'Identify the type of differential noise on a road test, then measure backlash and runout and check the tooth contact pattern.',
			tier: 3,
			requiredLevel: 2,
			minHours: 4,
			checklist: [
				{ text: 'Road test, noting noise on drive, coast, float and in turns', safety: true },
				{ text: 'Raise and support the vehicle', safety: true },
				{ text: 'Drain and inspect the fluid; remove the cover' },
				{ text: 'Measure backlash with a dial indicator at several points' },
				{ text: 'Measure ring gear runout' },
				{ text: 'Check the tooth contact pattern with marking compound' },
				{ text: 'Refit the cover, fill and record findings' }
			],
			specs: [
				{ label: 'Ring gear backlash, lower limit', value: 0.13, unit: 'mm', limit: 'minimum' },
				{ label: 'Ring gear backlash, upper limit', value: 0.2, unit: 'mm', limit: 'maximum' },
				{ label: 'Ring gear runout', value: 0.05, unit: 'mm', limit: 'maximum' },
				{ label: 'Cover bolt torque', value: 30, unit: 'N·m', limit: 'nominal' }
			],
			tools: [
				'Dial indicator with magnetic base',
				'Gear marking compound',
				'Drain pan',
				'Torque wrench'
			],
			cautions: [
				'Obey traffic law during the road test.',
				'Support the vehicle on stands or a hoist before working under it.'
			],
			serviceInfo: ['diagnostic procedure', 'specifications', 'repair procedure'],
			questions: [
				{
					prompt:
						'A noise occurs only when turning, not in a straight line. What is the likely source?',
					options: [
						{ text: 'The differential side and pinion gears', correct: true },
						{ text: 'The ring and pinion mesh', correct: false },
						{ text: 'The pinion bearing', correct: false }
					],
					explanation:
						'The differential gears only turn against each other when the wheels turn at different speeds.'
				},
				{
					prompt: 'Why measure backlash at several points around the ring gear?',
					options: [
						{ text: 'The dial indicator needs warming up', correct: false },
						{ text: 'To average out operator error only', correct: false },
						{ text: 'Runout or damage makes backlash vary around the gear', correct: true }
					],
					explanation: 'A large variation points to ring gear runout or a case problem.'
				}
			]
		}
	]
};
