import type { AreaDef } from '../../../framework/types';

export const area: AreaDef = {
	code: 'BRK',
	name: 'Brakes',
	tasks: [
		{
			code: 'BRK-01',
			title: 'Replace disc brake pads and rotors on one axle',
			description:
				'Renew the pads and rotors on both wheels of one axle, measuring and inspecting the parts that stay on the vehicle. The job is finished only when the pedal is firm and the brakes are proven on a road test.',
			tier: 1,
			requiredLevel: 4,
			minHours: 6,
			checklist: [
				{ text: 'Raise the vehicle at the lift points and support it securely', safety: true },
				{ text: 'Measure rotor thickness and lateral runout and compare with specification' },
				{ text: 'Inspect brake hoses, caliper seals and slide pins for damage, leaks and seizure' },
				{
					text: 'Retract the caliper piston while watching the master cylinder reservoir level',
					safety: true
				},
				{ text: 'Clean the bracket abutments, then clean and lubricate the slide pins' },
				{ text: 'Clean the hub face of rust so the new rotor sits flat' },
				{
					text: 'Torque the caliper bracket bolts, guide pin bolts and wheel nuts to specification, wheel nuts in a star pattern',
					safety: true
				},
				{ text: 'Pump the brake pedal until firm before moving the vehicle', safety: true },
				{ text: 'Check the reservoir level and top up to the full mark with the specified fluid' },
				{ text: 'Road test and bed in the new pads as directed', safety: true }
			],
			specs: [
				{ label: 'Rotor minimum (discard) thickness', value: 26, unit: 'mm', limit: 'minimum' },
				{ label: 'Rotor lateral runout', value: 0.05, unit: 'mm', limit: 'maximum' },
				{ label: 'Rotor thickness variation', value: 0.015, unit: 'mm', limit: 'maximum' },
				{ label: 'Pad lining thickness', value: 3, unit: 'mm', limit: 'minimum' },
				{ label: 'Caliper bracket bolt torque', value: 110, unit: 'N·m', limit: 'nominal' },
				{ label: 'Caliper guide pin bolt torque', value: 27, unit: 'N·m', limit: 'nominal' },
				{ label: 'Wheel nut torque', value: 140, unit: 'N·m', limit: 'nominal' }
			],
			tools: [
				'Vehicle hoist or jack and axle stands',
				'Outside micrometer',
				'Dial indicator with magnetic base',
				'Caliper piston tool',
				'Wire brush and brake cleaner',
				'Torque wrench'
			],
			cautions: [
				'Support the vehicle on stands or a hoist before removing a wheel.',
				'Do not blow brake dust off with compressed air; clean it wet and wear a mask.',
				'Never hang a caliper by its hose.',
				'The first pedal push after service may go to the floor: pump it before moving the car.'
			],
			serviceInfo: ['repair procedure', 'specifications', 'safety data sheet'],
			questions: [
				{
					prompt:
						'A rotor measures 25.8 mm. The discard thickness cast on the rotor is 26 mm. What should you do?',
					options: [
						{ text: 'Machine it lightly to clean up the surface', correct: false },
						{ text: 'Reuse it, because 0.2 mm is within normal tolerance', correct: false },
						{ text: 'Reuse it with thicker pads', correct: false },
						{ text: 'Replace the rotor', correct: true }
					],
					explanation:
						'Below discard thickness a rotor cannot absorb and shed heat safely and may crack, so it must be replaced.'
				},
				{
					prompt: 'Why must you pump the brake pedal before moving the vehicle after a pad change?',
					options: [
						{ text: 'To bleed air out of the calipers', correct: false },
						{ text: 'To reset the brake warning light', correct: false },
						{ text: 'To bed in the new pads', correct: false },
						{
							text: 'To push the retracted pistons back out against the pads so the first stop works',
							correct: true
						}
					],
					explanation:
						'The pistons were pushed back to fit the thicker pads, so the first pedal strokes only move them out to the pads and give no braking.'
				},
				{
					prompt:
						'Which two items commonly cause rapid or uneven pad wear if they are not serviced during the job?',
					options: [
						{ text: 'Seized or dry caliper slide pins', correct: true },
						{ text: 'Rusted, tight pad abutments on the bracket', correct: true },
						{ text: 'A low tyre pressure on the opposite axle', correct: false },
						{ text: 'The colour of the brake fluid', correct: false }
					],
					explanation:
						'Pins and abutments that bind stop the pads from sliding and releasing, so one pad drags and wears early.'
				},
				{
					prompt: 'Why should the hub face be cleaned of rust before fitting a new rotor?',
					options: [
						{ text: 'It helps the wheel nuts reach torque', correct: false },
						{ text: 'It is only cosmetic', correct: false },
						{
							text: 'Rust scale between hub and rotor tilts the rotor and causes runout and pulsation',
							correct: true
						},
						{ text: 'Rust makes the ABS sensor read wrong', correct: false }
					],
					explanation:
						'Even a thin layer of scale makes the rotor run out, which wears it unevenly and leads to pedal pulsation.'
				},
				{
					prompt:
						'Why are wheel nuts tightened with a torque wrench in a star pattern rather than run up fully with an impact wrench?',
					options: [
						{ text: 'The star pattern is only tradition', correct: false },
						{
							text: 'Even, correct clamping keeps the rotor and hub from distorting and the wheel secure',
							correct: true
						},
						{ text: 'An impact wrench cannot loosen them later', correct: false },
						{ text: 'It makes the wheel easier to balance', correct: false }
					],
					explanation:
						'Uneven or excessive clamping can distort the rotor hat and stretch studs, while too little lets the wheel work loose.'
				},
				{
					prompt:
						'While retracting the caliper piston, the reservoir fluid level rises close to the top. What is the right action?',
					options: [
						{ text: 'Remove some fluid first so it cannot overflow onto paint', correct: true },
						{ text: 'Keep pushing; it cannot overflow', correct: false },
						{ text: 'Loosen a brake line at the master cylinder', correct: false }
					],
					explanation:
						'Fluid displaced by the piston returns to the reservoir and brake fluid damages paint, so remove excess before pushing pistons back.'
				}
			]
		},
		{
			code: 'BRK-02',
			title: 'Service drum brakes on one axle',
			description:
				'Remove the drums, measure them, renew the shoes and hardware as needed and adjust the shoes to the drum. Both sides are done together so the axle brakes evenly.',
			tier: 1,
			requiredLevel: 3,
			minHours: 4,
			checklist: [
				{ text: 'Raise and support the vehicle and release the parking brake', safety: true },
				{ text: 'Remove the drums without blowing out dust; clean with a wet method' },
				{ text: 'Measure drum inside diameter and check for scoring, cracks and out-of-round' },
				{ text: 'Inspect the wheel cylinder for leaks and the backing plate for wear' },
				{ text: 'Work on one side at a time so the other side serves as a reference' },
				{ text: 'Fit the shoes, springs and adjuster correctly with a lubricated backing plate' },
				{ text: 'Pre-adjust the shoes to the drum with a shoe gauge' },
				{ text: 'Fit drums and torque wheel nuts to specification', safety: true },
				{ text: 'Pump the pedal until firm, then check and set the parking brake', safety: true },
				{ text: 'Road test for pull and proper stopping', safety: true }
			],
			specs: [
				{ label: 'Drum maximum inside diameter', value: 230.8, unit: 'mm', limit: 'maximum' },
				{ label: 'Shoe lining thickness', value: 1.5, unit: 'mm', limit: 'minimum' },
				{ label: 'Wheel cylinder bleeder screw torque', value: 8, unit: 'N·m', limit: 'nominal' },
				{ label: 'Wheel nut torque', value: 140, unit: 'N·m', limit: 'nominal' }
			],
			tools: [
				'Brake drum micrometer',
				'Brake shoe adjusting gauge',
				'Brake spring pliers and hold-down tool',
				'Wet brake cleaning equipment',
				'Torque wrench'
			],
			cautions: [
				'Brake dust is a health hazard: never use compressed air to clean drums.',
				'Return springs are under tension and can fly off; wear eye protection.',
				'Support the vehicle on stands or a hoist before removing a wheel.'
			],
			serviceInfo: ['repair procedure', 'specifications', 'safety data sheet'],
			questions: [
				{
					prompt: 'Why should you work on one side of the axle at a time?',
					options: [
						{ text: 'It is quicker to bleed afterwards', correct: false },
						{ text: 'The untouched side shows how springs and adjuster fit', correct: true },
						{ text: 'Removing both drums releases the parking brake cable', correct: false },
						{ text: 'The brake fluid will drain if both drums are off', correct: false }
					],
					explanation:
						'Drum hardware is easy to assemble wrongly, and the other side is an exact reference for where each part goes.'
				},
				{
					prompt:
						'A drum measures 231.2 mm; the maximum diameter stamped on it is 230.8 mm. What should you do?',
					options: [
						{ text: 'Machine it to remove the wear lip', correct: false },
						{ text: 'Reuse it and adjust the shoes out further', correct: false },
						{ text: 'Replace the drum', correct: true }
					],
					explanation:
						'An oversize drum is too thin to hold heat and may crack, and machining would only make it larger.'
				},
				{
					prompt: 'Which findings mean the wheel cylinder should be replaced? Choose two.',
					options: [
						{ text: 'Light surface rust on the outside of the body', correct: false },
						{ text: 'Dust on the backing plate', correct: false },
						{ text: 'Fluid wetting the inside of the boot or the shoe lining', correct: true },
						{ text: 'A seized piston that will not move', correct: true }
					],
					explanation:
						'A leaking or seized cylinder gives poor or uneven braking, and fluid contaminates the linings.'
				},
				{
					prompt:
						'Why are the shoes pre-adjusted to the drum with a gauge before the drum is fitted?',
					options: [
						{
							text: 'So the pedal is not low and the self-adjuster does not have to take up a large gap',
							correct: true
						},
						{ text: 'So the drum can be fitted without removing the hub', correct: false },
						{ text: 'To set the parking brake cable tension', correct: false },
						{ text: 'To centre the wheel cylinder', correct: false }
					],
					explanation:
						'Correct shoe-to-drum clearance gives a normal pedal height at once and even braking side to side.'
				},
				{
					prompt: 'Where should high-temperature brake lubricant be applied on a drum brake?',
					options: [
						{ text: 'On the lining surface', correct: false },
						{ text: 'Inside the drum friction surface', correct: false },
						{ text: 'On the wheel cylinder piston cups', correct: false },
						{ text: 'On the raised shoe contact pads of the backing plate', correct: true }
					],
					explanation:
						'The shoes slide on the backing plate pads; lubricant anywhere near the friction surfaces ruins braking.'
				}
			]
		},
		{
			code: 'BRK-03',
			title: 'Flush and bleed the brake hydraulic system',
			description:
				'Replace old brake fluid with new fluid of the specified grade and remove air from every circuit in the correct order. Confirm a firm pedal before the vehicle moves.',
			tier: 1,
			requiredLevel: 4,
			minHours: 2,
			checklist: [
				{ text: 'Confirm fluid grade and bleed sequence in service information' },
				{ text: 'Test the old fluid for moisture and record the result' },
				{ text: 'Raise and support the vehicle for access to all bleeders', safety: true },
				{
					text: 'Remove old fluid from the reservoir and refill with new fluid from a sealed container'
				},
				{
					text: 'Bleed each wheel in sequence until clean, bubble-free fluid flows, never letting the reservoir run dry',
					safety: true
				},
				{ text: 'Torque bleeder screws and fit dust caps', safety: true },
				{ text: 'Run the ABS bleed routine with a scan tool where specified' },
				{ text: 'Fill the reservoir to the full mark and check for leaks' },
				{ text: 'Check that the pedal is firm and high before moving the vehicle', safety: true },
				{ text: 'Road test, including a controlled stop', safety: true }
			],
			specs: [
				{ label: 'Fluid moisture content', value: 3, unit: '%', limit: 'maximum' },
				{ label: 'Pressure bleeder setting', value: 15, unit: 'psi', limit: 'maximum' },
				{ label: 'Bleeder screw torque', value: 9, unit: 'N·m', limit: 'nominal' },
				{ label: 'Typical flush volume', value: 1, unit: 'L', limit: 'nominal' }
			],
			tools: [
				'Pressure bleeder or vacuum bleeder',
				'Clear bleed hose and catch bottle',
				'Flare-nut (line) wrench',
				'Brake fluid tester',
				'Scan tool with ABS functions'
			],
			cautions: [
				'Brake fluid damages paint and irritates eyes and skin; wear glasses and gloves.',
				'Do not reuse fluid that has been bled out.',
				'A soft pedal means air is still in the system: do not move the vehicle.'
			],
			serviceInfo: ['repair procedure', 'specifications', 'safety data sheet'],
			questions: [
				{
					prompt: 'Why is brake fluid replaced at intervals even if nothing leaks?',
					options: [
						{ text: 'It loses colour', correct: false },
						{
							text: 'It absorbs water, which lowers its boiling point and corrodes parts',
							correct: true
						},
						{ text: 'It thickens and makes the pedal hard', correct: false },
						{ text: 'It evaporates from the reservoir', correct: false }
					],
					explanation:
						'Glycol-based fluid is hygroscopic; water in it can boil under heavy braking and cause a sudden soft pedal.'
				},
				{
					prompt: 'What happens if the reservoir runs dry during bleeding?',
					options: [
						{ text: 'The ABS module resets itself', correct: false },
						{ text: 'Air is drawn into the master cylinder and lines', correct: true },
						{ text: 'Nothing, as long as the bleeder is closed quickly', correct: false }
					],
					explanation:
						'Once air enters the master cylinder it must be bled out again, and air in an ABS unit can be hard to remove.'
				},
				{
					prompt: 'Why must new fluid come from a sealed container?',
					options: [
						{ text: 'It is a labelling rule only', correct: false },
						{ text: 'An open container has already absorbed moisture from the air', correct: true },
						{ text: 'Open fluid becomes thicker', correct: false }
					],
					explanation: 'Fluid left open picks up water and starts life with a lower boiling point.'
				},
				{
					prompt: 'How do you know a wheel circuit has been bled properly?',
					options: [
						{ text: 'Clean fluid flows from the bleeder with no bubbles', correct: true },
						{ text: 'A set number of pedal strokes has been made', correct: false },
						{ text: 'The reservoir level has dropped by half', correct: false },
						{ text: 'The brake warning lamp goes out', correct: false }
					],
					explanation:
						'Clear, bubble-free flow shows that old fluid and air have been pushed out of that circuit.'
				},
				{
					prompt:
						'After bleeding, the pedal is soft and sinks further with each stroke. What is the correct action?',
					options: [
						{ text: 'Pump the pedal and release the vehicle', correct: false },
						{ text: 'Add fluid above the full mark', correct: false },
						{ text: 'Keep the vehicle in the bay and find the air or leak', correct: true },
						{ text: 'Road test it gently to let the pedal settle', correct: false }
					],
					explanation:
						'A soft or sinking pedal means air or a leak remains, and the vehicle must not be driven until it is firm.'
				}
			]
		},
		{
			code: 'BRK-04',
			title: 'Replace a disc brake caliper',
			description:
				'Remove a leaking or seized caliper, fit a replacement with new sealing washers and bleed the affected circuit.',
			tier: 2,
			requiredLevel: 4,
			minHours: 2,
			checklist: [
				{ text: 'Raise and support the vehicle', safety: true },
				{ text: 'Fit a pedal depressor or hose clamp to limit fluid loss' },
				{ text: 'Disconnect the hose or banjo bolt and discard the old sealing washers' },
				{ text: 'Fit the caliper with slides cleaned and lubricated and pads seated correctly' },
				{
					text: 'Torque the banjo bolt with new washers, and the caliper bolts, to specification',
					safety: true
				},
				{ text: 'Bleed the circuit until the fluid is free of air', safety: true },
				{ text: 'Check that the hose is not twisted and clears the suspension lock to lock' },
				{ text: 'Pump the pedal until firm before moving the vehicle', safety: true }
			],
			specs: [
				{ label: 'Brake hose banjo bolt torque', value: 35, unit: 'N·m', limit: 'nominal' },
				{ label: 'Caliper guide pin bolt torque', value: 27, unit: 'N·m', limit: 'nominal' },
				{ label: 'Bleeder screw torque', value: 9, unit: 'N·m', limit: 'nominal' }
			],
			tools: ['Flare-nut wrench', 'Brake pedal depressor', 'Bleeding equipment', 'Torque wrench'],
			cautions: [
				'Brake fluid damages paint and skin; wear gloves and glasses.',
				'Support the vehicle on stands or a hoist before removing a wheel.'
			],
			serviceInfo: ['repair procedure', 'specifications'],
			questions: [
				{
					prompt: 'Why must new copper sealing washers be used on a banjo bolt?',
					options: [
						{ text: 'Copper corrodes in air within a day', correct: false },
						{ text: 'They set the hose angle', correct: false },
						{ text: 'Used washers are already crushed and may not seal again', correct: true }
					],
					explanation:
						'The washers deform to seal once; reused washers are a common cause of weeping fittings.'
				},
				{
					prompt:
						'After fitting the caliper, what must you check as the wheels are turned lock to lock?',
					options: [
						{ text: 'That the ABS light flashes', correct: false },
						{ text: 'That the hose is not twisted and does not rub on anything', correct: true },
						{ text: 'That the pads make a light scraping sound', correct: false }
					],
					explanation:
						'A twisted or rubbing hose can chafe through and burst, causing a loss of braking on that circuit.'
				},
				{
					prompt: 'Why limit fluid loss with a pedal depressor while the caliper is off?',
					options: [
						{
							text: 'It reduces spills and keeps air out of the rest of the system',
							correct: true
						},
						{ text: 'It holds the pads in place', correct: false },
						{ text: 'It stops the ABS pump running', correct: false }
					],
					explanation:
						'Keeping the reservoir from draining means only the disturbed circuit needs bleeding.'
				}
			]
		},
		{
			code: 'BRK-05',
			title: 'Bench bleed and install a master cylinder',
			description:
				'Bleed a replacement master cylinder on the bench before fitting it, then install it and bleed the system so the pedal is firm.',
			tier: 2,
			requiredLevel: 3,
			minHours: 2,
			checklist: [
				{ text: 'Clamp the master cylinder level in a vice by its mounting flange, not the bore' },
				{ text: 'Fit bleed tubes back into the reservoir and fill with new fluid' },
				{ text: 'Stroke the piston fully and slowly until no bubbles come out' },
				{ text: 'Plug the outlets and transfer the unit to the vehicle without spilling' },
				{
					text: 'Start the line fittings by hand to avoid cross-threading, then torque them',
					safety: true
				},
				{ text: 'Torque the mounting nuts to the booster to specification', safety: true },
				{ text: 'Bleed the system and check pedal height and firmness', safety: true },
				{ text: 'Check for leaks at the fittings with the pedal held down' }
			],
			specs: [
				{ label: 'Master cylinder mounting nut torque', value: 15, unit: 'N·m', limit: 'nominal' },
				{ label: 'Brake line flare nut torque', value: 16, unit: 'N·m', limit: 'nominal' }
			],
			tools: [
				'Bench vice with soft jaws',
				'Bench bleed kit',
				'Flare-nut wrenches',
				'Torque wrench'
			],
			cautions: [
				'Brake fluid damages paint: cover the wing and scuttle before starting.',
				'Do not clamp the cylinder body in a vice; it can distort the bore.'
			],
			serviceInfo: ['repair procedure', 'specifications'],
			questions: [
				{
					prompt: 'What is the main reason for bench bleeding a master cylinder before fitting it?',
					options: [
						{
							text: 'Air trapped in the bore is hard to remove once fitted and gives a low pedal',
							correct: true
						},
						{ text: 'It tests the booster', correct: false },
						{ text: 'It lubricates the pushrod', correct: false },
						{ text: 'It sets the pedal free play', correct: false }
					],
					explanation:
						'The cylinder sits high in the system and air in its bore resists being pushed down to the wheels.'
				},
				{
					prompt: 'Why start brake line fittings by hand before using a wrench?',
					options: [
						{ text: 'To measure the thread pitch', correct: false },
						{ text: 'Fittings are always left hand-tight', correct: false },
						{
							text: 'To avoid cross-threading the soft fitting and ruining the seal',
							correct: true
						}
					],
					explanation:
						'A cross-threaded flare nut will not seal and can leak or blow out under pressure.'
				}
			]
		},
		{
			code: 'BRK-06',
			title: 'Fabricate and install a brake line with double flares',
			description:
				'Replace a corroded section of steel brake line using tubing of the correct size and material, formed with a flare that matches the fittings.',
			tier: 2,
			requiredLevel: 3,
			minHours: 3,
			checklist: [
				{
					text: 'Identify line size and flare type (double flare or bubble flare) from the fittings'
				},
				{ text: 'Cut the tube square with a tubing cutter and deburr it' },
				{ text: 'Slide the fittings onto the tube before flaring' },
				{ text: 'Form the flare and inspect it for cracks and an even shape', safety: true },
				{ text: 'Bend the line with a bender, matching the original route and clearances' },
				{ text: 'Secure the line in its clips away from exhaust and moving parts', safety: true },
				{ text: 'Torque the flare nuts and bleed the affected circuit', safety: true },
				{ text: 'Inspect for leaks under pedal pressure before moving the vehicle', safety: true }
			],
			specs: [
				{ label: 'Brake line outside diameter', value: 4.75, unit: 'mm', limit: 'nominal' },
				{ label: 'Flare nut torque', value: 16, unit: 'N·m', limit: 'nominal' }
			],
			tools: [
				'Tubing cutter',
				'Deburring tool',
				'Flaring tool set',
				'Tube bender',
				'Flare-nut wrenches'
			],
			cautions: [
				'Use only steel or approved brake tubing; never use copper or compression fittings.',
				'A poor flare can leak or blow off under pressure: reject any cracked or off-centre flare.'
			],
			serviceInfo: ['repair procedure', 'specifications'],
			questions: [
				{
					prompt: 'What must you do before forming the second flare on a new line?',
					options: [
						{ text: 'Fill the line with brake fluid', correct: false },
						{ text: 'Slide both flare nuts onto the tube facing the right way', correct: true },
						{ text: 'Bend the line to shape', correct: false }
					],
					explanation:
						'Once both ends are flared, a forgotten fitting cannot be put on and the line must be remade.'
				},
				{
					prompt: 'Why must a double flare not be joined to a fitting made for a bubble flare?',
					options: [
						{ text: 'It is acceptable if torqued higher', correct: false },
						{ text: 'The seat shapes differ, so the joint will not seal', correct: true },
						{ text: 'It will seal but be harder to remove', correct: false }
					],
					explanation:
						'The flare and its seat must match; a mismatch leaks no matter how tight it is made.'
				},
				{
					prompt: 'Which are acceptable ways to repair a brake line? Choose two.',
					options: [
						{ text: 'Rubber fuel hose with clamps', correct: false },
						{
							text: 'Correctly flared steel or approved alloy tubing with proper unions',
							correct: true
						},
						{ text: 'A pre-flared replacement line of the correct size', correct: true },
						{ text: 'A compression fitting', correct: false }
					],
					explanation:
						'Only tubing and fittings rated for brake pressure may be used; compression fittings and hose clamps can blow off.'
				}
			]
		},
		{
			code: 'BRK-07',
			title: 'Adjust the parking brake',
			description:
				'Set the service brake shoe clearance first, then adjust the parking brake cable so the brake holds without dragging.',
			tier: 2,
			requiredLevel: 4,
			minHours: 1,
			checklist: [
				{ text: 'Chock the wheels and raise the axle so the wheels turn freely', safety: true },
				{ text: 'Confirm service brakes or drum-in-hat shoes are adjusted first' },
				{ text: 'Check cables for fraying, seized sheaths and free return' },
				{ text: 'Adjust cable tension at the equaliser to the specified travel' },
				{ text: 'Check that both wheels turn freely with the brake released' },
				{
					text: 'Verify the brake holds the vehicle on a slope or by a drive-off test',
					safety: true
				},
				{ text: 'Confirm the warning lamp switches on and off with the lever' }
			],
			specs: [],
			tools: ['Wheel chocks', 'Brake adjusting tool', 'Socket set'],
			cautions: [
				'Chock the wheels: the parking brake may not hold while you work on it.',
				'A parking brake that drags will overheat the rear brakes.'
			],
			serviceInfo: ['repair procedure', 'owner information'],
			questions: [
				{
					prompt: 'Why are the service brake shoes adjusted before the parking brake cable?',
					options: [
						{ text: 'The cable must be removed to adjust the shoes', correct: false },
						{ text: 'It is only the order in the book, not a reason', correct: false },
						{
							text: 'Cable adjustment would otherwise take up shoe wear and cause drag later',
							correct: true
						}
					],
					explanation:
						'Using the cable to make up for shoe clearance leaves the shoes partly applied once the self-adjuster works.'
				},
				{
					prompt: 'What two checks confirm the parking brake adjustment is correct?',
					options: [
						{ text: 'The lever reaches its highest possible position', correct: false },
						{ text: 'The cable is as tight as it can be made', correct: false },
						{ text: 'The wheels turn freely when the lever is released', correct: true },
						{ text: 'The brake holds within the specified lever travel', correct: true }
					],
					explanation:
						'A good adjustment holds the vehicle within normal travel and releases fully without drag.'
				}
			]
		},
		{
			code: 'BRK-08',
			title: 'Diagnose an ABS wheel-speed sensor fault',
			description:
				'Read and interpret ABS codes and live wheel-speed data, then test the sensor, wiring and tone ring to find the cause of the fault.',
			tier: 2,
			requiredLevel: 3,
			minHours: 3,
			checklist: [
				{ text: 'Record the codes and freeze-frame data before clearing anything' },
				{
					text: 'Compare live wheel-speed data from all four sensors on a test drive or on a hoist'
				},
				{ text: 'Raise and support the vehicle safely before spinning wheels', safety: true },
				{ text: 'Inspect the sensor, connector, harness and tone ring for damage or debris' },
				{ text: 'Test the sensor and circuit with a meter or oscilloscope to service information' },
				{ text: 'Repair the fault and clear the codes' },
				{
					text: 'Road test to confirm the ABS lamp stays off and the code does not return',
					safety: true
				}
			],
			specs: [
				{
					label: 'Passive sensor resistance, lower limit',
					value: 800,
					unit: 'Ω',
					limit: 'minimum'
				},
				{
					label: 'Passive sensor resistance, upper limit',
					value: 1400,
					unit: 'Ω',
					limit: 'maximum'
				},
				{
					label: 'Passive sensor AC output, wheel turned by hand',
					value: 0.1,
					unit: 'V',
					limit: 'minimum'
				},
				{
					label: 'Active sensor signal current, low state',
					value: 0.007,
					unit: 'A',
					limit: 'nominal'
				},
				{
					label: 'Active sensor signal current, high state',
					value: 0.014,
					unit: 'A',
					limit: 'nominal'
				},
				{ label: 'Sensor air gap', value: 1, unit: 'mm', limit: 'maximum' }
			],
			tools: ['Scan tool with ABS data', 'Digital multimeter', 'Oscilloscope', 'Wiring diagram'],
			cautions: [
				'Keep hands and leads clear of wheels spinning on the hoist.',
				'Do not probe through wire insulation; water entering the harness causes new faults.'
			],
			serviceInfo: ['diagnostic procedure', 'wiring diagram', 'specifications'],
			questions: [
				{
					prompt:
						'During a slow test drive, three wheel speeds read 20 km/h and one reads 0. What should you check first?',
					options: [
						{ text: 'The sensor, harness and tone ring at the wheel reading 0', correct: true },
						{ text: 'The ABS pump motor', correct: false },
						{ text: 'The brake fluid level', correct: false },
						{ text: 'The tyre pressure on the other three wheels', correct: false }
					],
					explanation:
						'Comparing wheels points straight to the one with no signal, so the fault lies in its sensor circuit or tone ring.'
				},
				{
					prompt:
						'Why should an active (two-wire, powered) sensor not be tested for resistance like a passive one?',
					options: [
						{
							text: 'It contains electronics, so a resistance reading does not show whether it works',
							correct: true
						},
						{ text: 'It has no wires to measure', correct: false },
						{ text: 'Its resistance is always zero', correct: false }
					],
					explanation:
						'An active sensor is checked by its supply voltage and switching signal current, not by a coil resistance.'
				},
				{
					prompt: 'A wheel-speed signal drops out only over bumps. What is the most likely cause?',
					options: [
						{
							text: 'An intermittent break or chafe in the harness near the suspension',
							correct: true
						},
						{ text: 'A failed ABS module', correct: false },
						{ text: 'Worn brake pads', correct: false }
					],
					explanation:
						'Faults that follow suspension movement point to wiring that flexes as the wheel moves.'
				}
			]
		},
		{
			code: 'BRK-09',
			title: 'Test brake pedal and vacuum booster operation',
			description:
				'Check pedal height, free play and reserve, and test the vacuum booster and its check valve before deciding on a repair.',
			tier: 1,
			requiredLevel: 4,
			minHours: 1,
			checklist: [
				{ text: 'Set the parking brake and put the transmission in Park or neutral', safety: true },
				{ text: 'Measure pedal free play and pedal height with the engine off' },
				{ text: 'With the engine off, pump the pedal to use up booster reserve' },
				{ text: 'Hold the pedal down and start the engine: the pedal should drop slightly' },
				{ text: 'Check that the pedal stays firm under steady pressure for 15 seconds' },
				{ text: 'Measure engine vacuum at the booster hose and test the check valve' },
				{
					text: 'Stop the engine, wait, and confirm the booster still gives assisted applications'
				},
				{ text: 'Record results and the recommended repair on the repair order' }
			],
			specs: [
				{ label: 'Engine vacuum at idle', value: 55, unit: 'kPa', limit: 'minimum' },
				{ label: 'Pedal free play, lower limit', value: 1, unit: 'mm', limit: 'minimum' },
				{ label: 'Pedal free play, upper limit', value: 6, unit: 'mm', limit: 'maximum' },
				{
					label: 'Pedal reserve distance to floor, firm push',
					value: 55,
					unit: 'mm',
					limit: 'minimum'
				}
			],
			tools: ['Vacuum gauge', 'Tape measure or rule', 'Hand vacuum pump'],
			cautions: [
				'Keep clear of the cooling fan and drive belt when the engine is running.',
				'Set the parking brake before starting the engine with your foot on the pedal.'
			],
			serviceInfo: ['diagnostic procedure', 'specifications'],
			questions: [
				{
					prompt:
						'With the engine off and the reserve pumped out, you hold the pedal down and start the engine. The pedal drops slightly. What does this show?',
					options: [
						{ text: 'The master cylinder is bypassing', correct: false },
						{ text: 'There is air in the lines', correct: false },
						{ text: 'The check valve is leaking', correct: false },
						{ text: 'The booster is giving assist', correct: true }
					],
					explanation:
						'When vacuum arrives the booster adds force to the pushrod, so the pedal moves a little further.'
				},
				{
					prompt:
						'The pedal slowly sinks to the floor under steady foot pressure, and there are no external leaks. What is the likely cause?',
					options: [
						{ text: 'Low engine vacuum', correct: false },
						{ text: 'Fluid bypassing the master cylinder seals', correct: true },
						{ text: 'A leaking booster diaphragm', correct: false },
						{ text: 'Worn brake pads', correct: false }
					],
					explanation:
						'Internal leakage past the piston seals lets the pedal sink without fluid being lost outside.'
				},
				{
					prompt: 'Which faults can cause a hard pedal that needs high effort? Choose two.',
					options: [
						{ text: 'Low vacuum supply to the booster', correct: true },
						{ text: 'A leaking booster diaphragm or failed check valve', correct: true },
						{ text: 'Air in the brake fluid', correct: false },
						{ text: 'Excessive pedal free play', correct: false }
					],
					explanation:
						'Without enough vacuum or with a leaking booster there is no assist, so the driver must push much harder.'
				},
				{
					prompt:
						'Why does the booster still give a few assisted stops after the engine is switched off?',
					options: [
						{ text: 'The check valve holds vacuum in the booster', correct: true },
						{ text: 'The master cylinder stores pressure', correct: false },
						{ text: 'The ABS pump keeps running', correct: false }
					],
					explanation:
						'The one-way check valve traps vacuum, so a booster that loses reserve quickly points to a leak or a bad valve.'
				},
				{
					prompt: 'Why is pedal free play needed rather than zero?',
					options: [
						{ text: 'To make the brake lights come on earlier', correct: false },
						{ text: 'To reduce pedal effort', correct: false },
						{
							text: 'So the master cylinder pistons return fully and uncover the compensating ports',
							correct: true
						}
					],
					explanation:
						'With no free play the pistons may stay slightly applied, trapping pressure and making the brakes drag and overheat.'
				}
			]
		},
		{
			code: 'BRK-10',
			title: 'Service rear pads with an electronic parking brake',
			description:
				'Put the electronic parking brake into service mode with a scan tool, replace the rear pads, then exit service mode and calibrate the system.',
			tier: 1,
			requiredLevel: 4,
			minHours: 1,
			checklist: [
				{ text: 'Connect a battery support unit and confirm battery voltage', safety: true },
				{ text: 'Chock the front wheels before the parking brake is released', safety: true },
				{ text: 'Enter service mode with the scan tool so the motors fully retract' },
				{ text: 'Raise and support the vehicle', safety: true },
				{
					text: 'Replace the pads, pressing the piston back straight without turning it unless specified'
				},
				{ text: 'Torque guide pin bolts and wheel nuts to specification', safety: true },
				{ text: 'Exit service mode and run the calibration or apply-release cycle' },
				{ text: 'Pump the service brake pedal until firm', safety: true },
				{ text: 'Check that the parking brake applies, releases and the warning lamp clears' }
			],
			specs: [
				{ label: 'Battery voltage during service mode', value: 12.2, unit: 'V', limit: 'minimum' },
				{ label: 'Caliper guide pin bolt torque', value: 27, unit: 'N·m', limit: 'nominal' },
				{ label: 'Wheel nut torque', value: 140, unit: 'N·m', limit: 'nominal' },
				{ label: 'Pad lining thickness', value: 3, unit: 'mm', limit: 'minimum' }
			],
			tools: [
				'Scan tool with parking brake functions',
				'Battery support unit',
				'Caliper piston tool',
				'Torque wrench'
			],
			cautions: [
				'Chock the wheels: in service mode the parking brake cannot hold the vehicle.',
				'Never force the piston back while the motor is applied; the actuator can be ruined.',
				'The actuator can move without warning if the system wakes up: keep fingers clear.'
			],
			serviceInfo: ['repair procedure', 'specifications', 'owner information'],
			questions: [
				{
					prompt:
						'Why must the electronic parking brake be put in service mode before pushing the piston back?',
					options: [
						{ text: 'Service mode drains the fluid from the caliper', correct: false },
						{ text: 'It disables the ABS lamp', correct: false },
						{ text: 'It is only needed to clear a code afterwards', correct: false },
						{
							text: 'The motor-driven spindle holds the piston, and forcing it damages the actuator',
							correct: true
						}
					],
					explanation:
						'The scan tool commands the motor to wind the spindle fully back so the piston can be pressed in without damage.'
				},
				{
					prompt: 'Why is a battery support unit connected during this job?',
					options: [
						{ text: 'To keep the ABS pump primed', correct: false },
						{ text: 'Low voltage can make the actuator or module fail mid-command', correct: true },
						{ text: 'To power the brake lights', correct: false }
					],
					explanation:
						'Modules may abort or set faults when voltage drops, leaving the actuator in an unknown position.'
				},
				{
					prompt: 'What must be done after new pads are fitted and before the car is returned?',
					options: [
						{ text: 'Exit service mode and calibrate the parking brake', correct: true },
						{ text: 'Disconnect the battery to reset the module', correct: false },
						{ text: 'Nothing: the system sets itself on the road', correct: false }
					],
					explanation:
						'Calibration teaches the system the new pad position so it applies with the correct force.'
				},
				{
					prompt: 'Why are the wheels chocked before entering service mode?',
					options: [
						{ text: 'The parking brake is released and cannot hold the vehicle', correct: true },
						{ text: 'The scan tool requires it to connect', correct: false },
						{ text: 'To stop the wheels turning when the pads are removed', correct: false }
					],
					explanation:
						'With the rear actuators retracted, only chocks and the transmission stop the vehicle rolling.'
				},
				{
					prompt:
						'Some rear calipers need the piston turned while pressing it in, others must only be pushed straight. How do you know which?',
					options: [
						{ text: 'Always turn it clockwise', correct: false },
						{ text: 'Push straight, and if it resists, hit it harder', correct: false },
						{ text: 'Check service information for that caliper', correct: true }
					],
					explanation:
						'The correct method depends on the caliper design, and the wrong one damages the piston or actuator.'
				}
			]
		},
		{
			code: 'BRK-11',
			title: 'Inspect brake lines and replace a flexible brake hose',
			description:
				'Inspect steel lines and flexible hoses for corrosion, cracking, swelling and chafing, and replace a faulty hose.',
			tier: 2,
			requiredLevel: 4,
			minHours: 1.5,
			checklist: [
				{ text: 'Raise and support the vehicle', safety: true },
				{ text: 'Inspect each hose with the wheels at full lock and with the suspension hanging' },
				{ text: 'Inspect steel lines along their length for corrosion and damage' },
				{ text: 'Free the line fitting with a flare-nut wrench while holding the hose hex' },
				{
					text: 'Fit the new hose without twist, using new sealing washers where used',
					safety: true
				},
				{ text: 'Torque the fittings and secure the hose brackets and clips', safety: true },
				{
					text: 'Bleed the circuit and check the pedal is firm before moving the vehicle',
					safety: true
				}
			],
			specs: [
				{ label: 'Brake hose banjo bolt torque', value: 35, unit: 'N·m', limit: 'nominal' },
				{ label: 'Hose-to-line flare nut torque', value: 16, unit: 'N·m', limit: 'nominal' }
			],
			tools: ['Flare-nut wrenches', 'Inspection light', 'Bleeding equipment', 'Torque wrench'],
			cautions: [
				'Use a flare-nut wrench; an open-end wrench rounds the fitting.',
				'Brake fluid damages paint and skin; wear gloves and glasses.'
			],
			serviceInfo: ['repair procedure', 'specifications'],
			questions: [
				{
					prompt: 'A hose swells like a balloon when the pedal is pressed. What is the effect?',
					options: [
						{ text: 'No effect until it leaks', correct: false },
						{ text: 'A spongy pedal and weaker braking at that wheel', correct: true },
						{ text: 'Harder pedal and faster stops', correct: false }
					],
					explanation:
						'Pressure that swells the hose is not reaching the caliper, and the weakened hose may burst.'
				},
				{
					prompt: 'Why is a flare-nut wrench used on brake line fittings?',
					options: [
						{ text: 'It limits the torque applied', correct: false },
						{ text: 'It grips more flats and is less likely to round the soft nut', correct: true },
						{ text: 'It is the only size that fits', correct: false }
					],
					explanation:
						'Rounded fittings often mean a new line, so the tool that grips on more flats is used.'
				}
			]
		},
		{
			code: 'BRK-12',
			title: 'Machine a brake rotor on a lathe',
			description:
				'Refinish a rotor on a bench or on-vehicle lathe when it is above its minimum refinish thickness, to remove runout or thickness variation.',
			tier: 3,
			requiredLevel: 2,
			minHours: 3,
			checklist: [
				{ text: 'Measure thickness first and confirm there is enough material to machine' },
				{ text: 'Mount the rotor with clean adapters and fit the vibration damper band' },
				{ text: 'Check setup runout before cutting and correct the mounting if needed' },
				{ text: 'Wear eye protection and keep hands clear of the turning rotor', safety: true },
				{ text: 'Make the cut at the specified depth and feed rate, both faces' },
				{ text: 'Re-measure thickness and runout after machining' },
				{ text: 'Clean the rotor faces with soap and water before fitting' }
			],
			specs: [
				{ label: 'Rotor minimum refinish thickness', value: 26.5, unit: 'mm', limit: 'minimum' },
				{ label: 'Rotor minimum (discard) thickness', value: 26, unit: 'mm', limit: 'minimum' },
				{ label: 'Rotor lateral runout after machining', value: 0.05, unit: 'mm', limit: 'maximum' }
			],
			tools: ['Brake lathe', 'Outside micrometer', 'Dial indicator', 'Safety glasses'],
			cautions: [
				'Keep hands, sleeves and rags away from the turning rotor.',
				'Metal swarf is sharp and hot; wear eye protection.'
			],
			serviceInfo: ['repair procedure', 'specifications'],
			questions: [
				{
					prompt:
						'A rotor measures 26.7 mm before machining. Refinish minimum is 26.5 mm and discard is 26 mm. What is the right decision?',
					options: [
						{
							text: 'Machine only if the cut will leave at least 26.5 mm, otherwise replace',
							correct: true
						},
						{ text: 'Machine to 26 mm since that is the discard limit', correct: false },
						{ text: 'Always replace a rotor instead of machining', correct: false }
					],
					explanation:
						'The refinish limit leaves wear margin above discard, so a machined rotor must finish at or above it.'
				},
				{
					prompt: 'Why are machined rotor faces washed with soap and water?',
					options: [
						{ text: 'To cool the rotor quickly', correct: false },
						{ text: 'To stop it rusting forever', correct: false },
						{ text: 'To remove fine metal particles that would embed in the pads', correct: true }
					],
					explanation: 'Loose particles contaminate new pads and cause noise and uneven bedding.'
				}
			]
		}
	]
};
