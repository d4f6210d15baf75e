import type { AreaDef } from '../../../framework/types';

export const area: AreaDef = {
	code: 'SUS',
	name: 'Suspension and steering',
	tasks: [
		{
			code: 'SUS-01',
			title: 'Check wheel alignment and adjust front toe',
			description:
				'Prepare the vehicle, measure the alignment angles on alignment equipment and set front toe with the steering wheel centred. The work is proven by a straight steering wheel and no pull on a road test.',
			tier: 1,
			requiredLevel: 3,
			minHours: 6,
			checklist: [
				{ text: 'Set tyre pressures and check tyre wear and ride height' },
				{
					text: 'Check steering and suspension parts for play; worn parts are repaired before aligning',
					safety: true
				},
				{
					text: 'Position the vehicle on the rack with turn plates and slip plates locked, wheels chocked',
					safety: true
				},
				{ text: 'Mount the targets or heads and compensate as the equipment directs' },
				{ text: 'Record the before readings' },
				{ text: 'Centre the steering wheel and fit a steering wheel holder' },
				{ text: 'Adjust toe on both sides, turning the tie-rods by matching amounts' },
				{ text: 'Torque the tie-rod jam nuts and check the boots are not twisted', safety: true },
				{ text: 'Record the after readings for the repair order' },
				{ text: 'Road test for a centred steering wheel and no pull', safety: true }
			],
			specs: [
				{ label: 'Front total toe-in, target', value: 1, unit: 'mm', limit: 'nominal' },
				{
					label: 'Front total toe-in, lower limit (toe-out is negative)',
					value: -1,
					unit: 'mm',
					limit: 'minimum'
				},
				{ label: 'Front total toe-in, upper limit', value: 3, unit: 'mm', limit: 'maximum' },
				{ label: 'Tie-rod jam nut torque', value: 50, unit: 'N·m', limit: 'nominal' },
				{ label: 'Cold tyre pressure', value: 230, unit: 'kPa', limit: 'nominal' }
			],
			tools: [
				'Wheel alignment system',
				'Steering wheel holder',
				'Brake pedal depressor',
				'Tyre pressure gauge',
				'Torque wrench'
			],
			cautions: [
				'Keep turn plates locked while driving on and off the rack.',
				'Keep clear of the rack and lift mechanism when it is moving.'
			],
			serviceInfo: ['repair procedure', 'specifications', 'service bulletin'],
			questions: [
				{
					prompt: 'Why are worn steering and suspension parts repaired before an alignment?',
					options: [
						{ text: 'It is only needed for the rear axle', correct: false },
						{
							text: 'Loose parts let the angles change while driving, so settings made on them do not hold',
							correct: true
						},
						{ text: 'The alignment machine cannot read a worn car', correct: false }
					],
					explanation:
						'An alignment on worn parts gives numbers that change as soon as the vehicle moves.'
				},
				{
					prompt:
						'Toe is within specification but the steering wheel is off centre. How is it corrected?',
					options: [
						{
							text: 'Lengthen one tie-rod and shorten the other by the same amount',
							correct: true
						},
						{ text: 'Remove the steering wheel and refit it one spline over', correct: false },
						{ text: 'Adjust camber on one side', correct: false },
						{ text: 'Adjust only one tie-rod', correct: false }
					],
					explanation:
						'Equal and opposite changes move the wheel centre without changing total toe.'
				},
				{
					prompt: 'Which tyre wear pattern is typical of too much toe?',
					options: [
						{ text: 'Cupped, scalloped patches', correct: false },
						{ text: 'A flat spot from locking the brakes', correct: false },
						{ text: 'A feathered edge on the tread ribs across the tyre', correct: true },
						{ text: 'Wear in the centre of the tread only', correct: false }
					],
					explanation:
						'Toe makes the tyre scrub sideways as it rolls, which pushes the tread ribs into a feathered shape.'
				},
				{
					prompt: 'Why are tyre pressures set before alignment readings are taken?',
					options: [
						{ text: 'The targets will not clamp to a soft tyre', correct: false },
						{ text: 'It is only for the customer report', correct: false },
						{ text: 'Pressure affects ride height and the angles measured', correct: true }
					],
					explanation: 'A low tyre lowers that corner and changes camber and toe readings.'
				},
				{
					prompt: 'Why is the thrust line of the rear wheels used as the reference for front toe?',
					options: [
						{ text: 'The front wheels cannot be measured alone', correct: false },
						{ text: 'It is only needed on four-wheel-drive vehicles', correct: false },
						{
							text: 'The rear axle sets the direction the car travels, so the front must be aligned to it to keep the steering wheel straight',
							correct: true
						}
					],
					explanation:
						'If the rear wheels point off centre, a front set to the body centreline leaves the steering wheel crooked.'
				}
			]
		},
		{
			code: 'SUS-02',
			title: 'Replace an outer tie-rod end',
			description:
				'Replace a worn outer tie-rod end, keep the toe close by matching the old position, lock the fasteners correctly and set the toe afterwards.',
			tier: 1,
			requiredLevel: 4,
			minHours: 2,
			checklist: [
				{ text: 'Raise and support the vehicle', safety: true },
				{
					text: "Confirm play at the tie-rod end by rocking the wheel at the 3 and 9 o'clock positions"
				},
				{ text: 'Mark the jam nut position or count the turns when removing the old end' },
				{ text: 'Separate the taper with a puller without damaging the knuckle or boot' },
				{ text: 'Fit the new end the same number of turns, with the taper clean and dry' },
				{
					text: 'Torque the stud nut, then tighten further to the next slot and fit a new cotter pin',
					safety: true
				},
				{ text: 'Torque the jam nut to specification', safety: true },
				{ text: 'Check the steering moves freely lock to lock with no binding' },
				{ text: 'Set toe on alignment equipment and road test', safety: true }
			],
			specs: [
				{ label: 'Tie-rod end stud nut torque', value: 45, unit: 'N·m', limit: 'nominal' },
				{ label: 'Tie-rod jam nut torque', value: 50, unit: 'N·m', limit: 'nominal' },
				{ label: 'Wheel nut torque', value: 110, unit: 'N·m', limit: 'nominal' }
			],
			tools: ['Tie-rod end puller', 'Cotter pin pliers', 'Alignment system', 'Torque wrench'],
			cautions: [
				'Support the vehicle on stands or a hoist before removing a wheel.',
				'A loose tie-rod end can cause loss of steering: lock every fastener.'
			],
			serviceInfo: ['repair procedure', 'specifications'],
			questions: [
				{
					prompt:
						'The cotter pin hole does not line up after torquing the castle nut. What should you do?',
					options: [
						{ text: 'Bend the old pin to fit', correct: false },
						{ text: 'Tighten further to the next slot', correct: true },
						{ text: 'Loosen the nut back to the nearest slot', correct: false },
						{ text: 'Leave the cotter pin out', correct: false }
					],
					explanation:
						'Backing off reduces the clamp on the taper; the specification allows tightening to the next slot.'
				},
				{
					prompt: 'Why must toe be set after replacing a tie-rod end?',
					options: [
						{
							text: 'A small length difference changes toe and wears the tyres quickly',
							correct: true
						},
						{ text: 'The steering angle sensor needs a new code', correct: false },
						{ text: 'It is only needed if the car pulls', correct: false }
					],
					explanation:
						'Matching the turns gets close, but only a measurement confirms toe is within specification.'
				},
				{
					prompt: 'Why must the taper be clean and dry?',
					options: [
						{
							text: 'The taper locks by friction; grease lets it turn and not seat',
							correct: true
						},
						{ text: 'Grease on the taper damages the boot', correct: false },
						{ text: 'Clean tapers need less torque', correct: false }
					],
					explanation:
						'A greased taper can spin when the nut is torqued and may work loose in service.'
				},
				{
					prompt:
						"Rocking the wheel at 3 and 9 o'clock shows play that is visible at the tie-rod end. What does this mean?",
					options: [
						{ text: 'The wheel bearing is worn', correct: false },
						{ text: 'The ball joint is worn', correct: false },
						{ text: 'The tie-rod end is worn', correct: true }
					],
					explanation:
						'Side-to-side rocking loads the steering linkage, so play seen at the tie-rod end points to it.'
				},
				{
					prompt: 'Why is a new cotter pin used every time?',
					options: [
						{ text: 'New pins allow less torque', correct: false },
						{ text: 'A bent pin has been weakened and can break', correct: true },
						{ text: 'Old pins are the wrong length', correct: false }
					],
					explanation: 'The cotter pin is the last thing stopping the nut from coming off.'
				}
			]
		},
		{
			code: 'SUS-03',
			title: 'Inspect ball joints, bushings and steering linkage',
			description:
				'Load or unload each joint as service information directs, measure play and inspect bushings, boots and linkage, then record and recommend repairs.',
			tier: 1,
			requiredLevel: 4,
			minHours: 2,
			checklist: [
				{ text: 'Look up where to support the vehicle to load or unload the joint being tested' },
				{ text: 'Raise and support the vehicle at the specified points', safety: true },
				{ text: 'Measure ball joint play with a dial indicator while levering the wheel' },
				{ text: 'Check wear-indicator joints with the weight on the wheels' },
				{ text: 'Inspect bushings for cracks, separation and movement' },
				{ text: 'Inspect boots for tears and grease loss' },
				{ text: 'Check tie-rods, stabiliser links and rack mounts for play' },
				{ text: 'Record measurements and recommended repairs on the repair order' }
			],
			specs: [
				{ label: 'Load-carrying ball joint axial play', value: 0.5, unit: 'mm', limit: 'maximum' },
				{ label: 'Follower ball joint free play', value: 0, unit: 'mm', limit: 'maximum' }
			],
			tools: ['Dial indicator with clamp', 'Pry bar', 'Inspection light', 'Floor jack'],
			cautions: [
				'Use stands when the vehicle is lifted under a control arm; never rely on the jack.',
				'Keep fingers out from between the parts while levering.'
			],
			serviceInfo: ['diagnostic procedure', 'specifications'],
			questions: [
				{
					prompt:
						'Why does it matter whether the vehicle is supported under the frame or under the lower arm when checking ball joints?',
					options: [
						{ text: 'Only so the wheel can turn', correct: false },
						{
							text: 'The load-carrying joint must be unloaded for its play to show',
							correct: true
						},
						{ text: 'It changes the tyre pressure', correct: false }
					],
					explanation:
						'A joint held under spring load hides its wear, so the support point depends on where the spring sits.'
				},
				{
					prompt:
						"You feel play when rocking the wheel at the 12 and 6 o'clock positions. It goes away when the brake pedal is held. What is worn?",
					options: [
						{ text: 'The wheel bearing', correct: true },
						{ text: 'The ball joint', correct: false },
						{ text: 'The tie-rod end', correct: false }
					],
					explanation:
						'Applying the brake locks the hub to the knuckle, so play that disappears was in the bearing.'
				},
				{
					prompt: 'How is a wear-indicator ball joint checked?',
					options: [
						{ text: 'With the wheel hanging, by measuring radial play', correct: false },
						{ text: 'By greasing it and watching for leaks', correct: false },
						{
							text: 'With the weight on the wheel, see whether the indicator collar has sunk into the housing',
							correct: true
						}
					],
					explanation: 'The indicator only shows wear with the joint under its normal load.'
				},
				{
					prompt: 'A ball joint has no play but its boot is torn. What do you recommend?',
					options: [
						{ text: 'Nothing until play appears', correct: false },
						{ text: 'Grease it more often', correct: false },
						{ text: 'Replace the joint, because dirt and water will soon wear it', correct: true }
					],
					explanation: 'A sealed joint with a torn boot loses grease and fails early.'
				},
				{
					prompt: 'Which symptoms can come from worn suspension bushings? Choose two.',
					options: [
						{ text: 'A soft brake pedal', correct: false },
						{ text: 'An engine misfire', correct: false },
						{ text: 'A clunk over bumps', correct: true },
						{ text: 'Wander and a change in alignment under braking', correct: true }
					],
					explanation:
						'Worn bushings let the arms move, giving noise and changing alignment as loads change.'
				}
			]
		},
		{
			code: 'SUS-04',
			title: 'Replace a front strut assembly using a spring compressor',
			description:
				'Remove a strut, compress the spring safely to transfer the parts or fit a complete assembly, refit it to specification and set the alignment.',
			tier: 1,
			requiredLevel: 3,
			minHours: 4,
			checklist: [
				{ text: 'Raise and support the vehicle and remove the wheel', safety: true },
				{ text: 'Mark the strut-to-knuckle position where it sets camber' },
				{ text: 'Free the brake hose bracket, sensor lead and stabiliser link' },
				{
					text: 'Remove the strut while supporting the knuckle so the hose and axle are not strained',
					safety: true
				},
				{
					text: 'Compress the spring evenly with both hooks fully engaged before loosening the rod nut',
					safety: true
				},
				{ text: 'Seat the spring ends against the stops in the spring seats' },
				{ text: 'Release the compressor slowly and evenly', safety: true },
				{ text: 'Torque the rod nut, top mount and knuckle bolts to specification', safety: true },
				{ text: 'Check and set the alignment', safety: true },
				{ text: 'Road test for noise and handling', safety: true }
			],
			specs: [
				{ label: 'Strut rod nut torque', value: 50, unit: 'N·m', limit: 'nominal' },
				{ label: 'Upper mount nut torque', value: 30, unit: 'N·m', limit: 'nominal' },
				{ label: 'Strut-to-knuckle bolt torque', value: 150, unit: 'N·m', limit: 'nominal' },
				{ label: 'Wheel nut torque', value: 110, unit: 'N·m', limit: 'nominal' }
			],
			tools: [
				'Approved coil spring compressor',
				'Strut rod nut socket set',
				'Alignment system',
				'Torque wrench'
			],
			cautions: [
				'A compressed coil spring stores enough energy to kill: use an approved compressor and stand to the side.',
				'Never loosen the rod nut until the spring is compressed off its seats.',
				'Support the vehicle on stands or a hoist before removing a wheel.'
			],
			serviceInfo: ['repair procedure', 'specifications', 'safety data sheet'],
			questions: [
				{
					prompt: 'Why must the spring be compressed before the rod nut is loosened?',
					options: [
						{
							text: 'The nut holds the spring load; loosening it releases the spring violently',
							correct: true
						},
						{ text: 'So the strut can be bled', correct: false },
						{ text: 'To protect the rod threads only', correct: false }
					],
					explanation:
						'Until the spring is clear of its seats, the rod nut is all that holds it together.'
				},
				{
					prompt: 'Why compress the spring evenly with the hooks opposite each other?',
					options: [
						{
							text: 'Uneven compression can bow the spring and let it slip from the hooks',
							correct: true
						},
						{ text: 'It compresses faster', correct: false },
						{ text: 'It keeps the rubber isolator clean', correct: false }
					],
					explanation:
						'A spring loaded on one side can kick out of the compressor with great force.'
				},
				{
					prompt: 'Why is the alignment checked after replacing a strut?',
					options: [
						{ text: 'It is only done if the car pulls', correct: false },
						{ text: 'The strut must be bedded in first', correct: false },
						{
							text: 'The strut-to-knuckle position and new parts can change camber and toe',
							correct: true
						}
					],
					explanation:
						'Small changes at the knuckle change camber and toe and wear the tyres quickly.'
				},
				{
					prompt: 'What can happen if the spring end is not seated against the stop in its seat?',
					options: [
						{ text: 'Nothing', correct: false },
						{ text: 'Noise, wrong ride height and the spring shifting in service', correct: true },
						{ text: 'Better ride comfort', correct: false }
					],
					explanation:
						'The stops locate the spring; a misplaced end changes height and can rub or click.'
				},
				{
					prompt: 'Which two steps protect the brake hose and axle while the strut is out?',
					options: [
						{ text: 'Open the bleeder screw', correct: false },
						{ text: 'Remove the wheel bearing', correct: false },
						{ text: 'Support the knuckle so it does not hang', correct: true },
						{ text: 'Free the hose bracket before moving the knuckle', correct: true }
					],
					explanation:
						'A hanging knuckle stretches the brake hose and can pull the inner axle joint apart.'
				}
			]
		},
		{
			code: 'SUS-05',
			title: 'Replace rear shock absorbers',
			description:
				'Replace a pair of shock absorbers with the axle supported and tighten the mounts at ride height.',
			tier: 2,
			requiredLevel: 4,
			minHours: 2,
			checklist: [
				{ text: 'Raise and support the vehicle', safety: true },
				{ text: 'Support the axle with a jack before removing the lower mount', safety: true },
				{ text: 'Replace both shocks on the axle, with the bushings in the correct order' },
				{ text: 'Raise the axle to ride height before final tightening of rubber-bushed mounts' },
				{ text: 'Torque upper and lower mounts to specification', safety: true },
				{ text: 'Road test for noise and body control', safety: true }
			],
			specs: [
				{ label: 'Upper mount nut torque', value: 25, unit: 'N·m', limit: 'nominal' },
				{ label: 'Lower mount bolt torque', value: 80, unit: 'N·m', limit: 'nominal' }
			],
			tools: ['Floor jack or transmission jack', 'Socket set', 'Torque wrench'],
			cautions: [
				'The shock may limit axle travel; support the axle before unbolting it.',
				'Gas-charged shocks extend on their own when released: keep your face clear.'
			],
			serviceInfo: ['repair procedure', 'specifications'],
			questions: [
				{
					prompt: 'Why support the axle before removing the lower shock mount?',
					options: [
						{
							text: 'The shock often limits travel; without it the axle drops and strains hoses or unseats springs',
							correct: true
						},
						{ text: 'To keep the brake fluid in', correct: false },
						{ text: 'So the wheel does not turn', correct: false }
					],
					explanation:
						'Removing the travel limit lets the axle fall further than its hoses and springs allow.'
				},
				{
					prompt: 'Why are shocks replaced in pairs on an axle?',
					options: [
						{ text: 'They are only sold in pairs', correct: false },
						{ text: 'It halves the labour time', correct: false },
						{ text: 'To keep damping even side to side', correct: true }
					],
					explanation: 'Uneven damping makes the vehicle unstable over bumps and in turns.'
				},
				{
					prompt: 'Which finding shows a shock should be replaced?',
					options: [
						{ text: 'A light film of dust on the body', correct: false },
						{ text: 'A faint mist near the seal with no dripping', correct: false },
						{ text: 'Oil running down the body from the seal', correct: true }
					],
					explanation:
						'A light mist can be normal, but oil running from the seal means the shock has lost fluid.'
				}
			]
		},
		{
			code: 'SUS-06',
			title: 'Diagnose tyre wear patterns and rotate tyres',
			description:
				'Read tyre wear patterns to find their cause, measure tread depth and pressures, and rotate the tyres in the specified pattern.',
			tier: 1,
			requiredLevel: 4,
			minHours: 2,
			checklist: [
				{ text: 'Check and record cold tyre pressures against the door placard' },
				{ text: 'Measure tread depth at the inner, centre and outer ribs of each tyre' },
				{ text: 'Identify wear patterns and link each one to its likely cause' },
				{ text: 'Inspect for cuts, bulges, exposed cords and age cracking', safety: true },
				{ text: 'Raise and support the vehicle', safety: true },
				{
					text: 'Rotate the tyres in the specified pattern, keeping directional tyres on their side'
				},
				{ text: 'Torque the wheel nuts in a star pattern to specification', safety: true },
				{ text: 'Set pressures and relearn tyre pressure sensor positions if required' },
				{ text: 'Record findings and recommendations' }
			],
			specs: [
				{ label: 'Tread depth', value: 1.6, unit: 'mm', limit: 'minimum' },
				{ label: 'Cold tyre pressure', value: 230, unit: 'kPa', limit: 'nominal' },
				{ label: 'Wheel nut torque', value: 110, unit: 'N·m', limit: 'nominal' }
			],
			tools: ['Tread depth gauge', 'Tyre pressure gauge', 'Torque wrench', 'TPMS tool'],
			cautions: [
				'Support the vehicle on stands or a hoist before removing a wheel.',
				'A tyre with exposed cords or a bulge can fail suddenly: do not inflate or return it to service.'
			],
			serviceInfo: ['specifications', 'owner information', 'maintenance schedule'],
			questions: [
				{
					prompt:
						'Both shoulders of a tyre are worn and the centre is good. What is the likely cause?',
					options: [
						{ text: 'Running over-inflated', correct: false },
						{ text: 'Too much toe-in', correct: false },
						{ text: 'Worn shocks', correct: false },
						{ text: 'Running under-inflated', correct: true }
					],
					explanation: 'A soft tyre sags in the middle, so the shoulders carry the load and wear.'
				},
				{
					prompt: 'The centre of the tread is worn more than the edges. What does this indicate?',
					options: [
						{ text: 'Over-inflation', correct: true },
						{ text: 'Under-inflation', correct: false },
						{ text: 'Negative camber', correct: false }
					],
					explanation: 'Too much pressure crowns the tread so the centre carries the load.'
				},
				{
					prompt: 'Cupped, scalloped patches around the tyre point to which causes? Choose two.',
					options: [
						{ text: 'Worn shock absorbers', correct: true },
						{ text: 'An out-of-balance wheel', correct: true },
						{ text: 'Correct tyre pressure', correct: false },
						{ text: 'A new alignment', correct: false }
					],
					explanation: 'A wheel that bounces touches the road unevenly and wears in patches.'
				},
				{
					prompt: 'Which pressure should tyres be set to?',
					options: [
						{ text: 'The maximum pressure on the sidewall', correct: false },
						{ text: 'Whatever pressure feels right on a road test', correct: false },
						{ text: 'The cold pressure on the vehicle placard', correct: true }
					],
					explanation:
						'The sidewall figure is the tyre limit; the placard value suits the vehicle load and handling.'
				},
				{
					prompt: 'How are directional tyres rotated?',
					options: [
						{ text: 'They cannot be rotated', correct: false },
						{ text: 'Front to rear on the same side only', correct: true },
						{ text: 'In a cross pattern', correct: false }
					],
					explanation: 'Directional tyres must keep turning the way the arrow points.'
				}
			]
		},
		{
			code: 'SUS-07',
			title: 'Check power steering fluid and diagnose leaks and noise',
			description:
				'Check the hydraulic power steering fluid level and condition, find leaks and noise causes, and bleed air from the system.',
			tier: 2,
			requiredLevel: 3,
			minHours: 1.5,
			checklist: [
				{ text: 'Check the level at the correct temperature mark and the fluid type' },
				{ text: 'Look for foam or a milky colour showing air' },
				{ text: 'Inspect the pump, hoses and fittings for leaks' },
				{ text: 'Raise and support the vehicle to inspect the rack and boots', safety: true },
				{ text: 'Check the boots for fluid that shows an inner rack seal leak' },
				{ text: 'Bleed air by turning lock to lock with the front wheels raised', safety: true },
				{ text: 'Record the fault and recommend the repair' }
			],
			specs: [
				{
					label: 'Fluid temperature for hot-range reading, lower limit',
					value: 50,
					unit: '°C',
					limit: 'minimum'
				},
				{
					label: 'Fluid temperature for hot-range reading, upper limit',
					value: 80,
					unit: '°C',
					limit: 'maximum'
				},
				{ label: 'Pressure hose fitting torque', value: 30, unit: 'N·m', limit: 'nominal' }
			],
			tools: ['Inspection light', 'Thermometer', 'Flare-nut wrenches', 'Fluid pump'],
			cautions: [
				'Power steering fluid is hot and under high pressure when the engine runs.',
				'Keep clear of the drive belt and fan when the engine is running.'
			],
			serviceInfo: ['diagnostic procedure', 'specifications'],
			questions: [
				{
					prompt: 'Fluid is found inside a steering rack boot. What does this mean?',
					options: [
						{ text: 'The reservoir is overfilled', correct: false },
						{ text: 'An inner rack seal is leaking', correct: true },
						{ text: 'The boot clamp is loose', correct: false }
					],
					explanation:
						'The boot collects fluid that passes the inner seal, which usually means a rack repair.'
				},
				{
					prompt: 'Why should the wheel not be held at full lock for more than a few seconds?',
					options: [
						{
							text: 'The pump runs against its relief valve and overheats the fluid',
							correct: true
						},
						{ text: 'It drains the battery', correct: false },
						{ text: 'It damages the tyres', correct: false }
					],
					explanation:
						'At full lock the pump makes maximum pressure, and the energy turns into heat.'
				},
				{
					prompt:
						'A whine that worsens when steering, with foamy fluid, most likely comes from what?',
					options: [
						{ text: 'A worn outer tie-rod end', correct: false },
						{ text: 'Correct fluid level', correct: false },
						{ text: 'Air in the fluid from a low level or a suction leak', correct: true }
					],
					explanation: 'Air in the fluid makes the pump noisy and the assist uneven.'
				}
			]
		},
		{
			code: 'SUS-08',
			title: 'Diagnose electric power steering concerns',
			description:
				'Diagnose heavy, uneven or lost steering assist on an electric system using codes, live data and electrical tests, and rule out mechanical causes.',
			tier: 3,
			requiredLevel: 2,
			minHours: 3,
			checklist: [
				{ text: 'Verify the concern and any warning lamp' },
				{ text: 'Test battery state and charging voltage' },
				{
					text: 'Read codes and live data such as torque sensor, motor current and steering angle'
				},
				{ text: 'Measure voltage drop on the assist motor supply and ground under load' },
				{ text: 'Check tyre pressures and linkage for binding' },
				{
					text: 'Disconnect the battery before unplugging power steering connectors',
					safety: true
				},
				{ text: 'Run any required calibration after repair' },
				{ text: 'Road test to confirm normal assist', safety: true }
			],
			specs: [
				{ label: 'Battery voltage, engine off', value: 12.4, unit: 'V', limit: 'minimum' },
				{ label: 'Charging voltage at idle', value: 13.5, unit: 'V', limit: 'minimum' },
				{
					label: 'Voltage drop on assist supply under load',
					value: 0.3,
					unit: 'V',
					limit: 'maximum'
				}
			],
			tools: ['Scan tool', 'Digital multimeter', 'Battery tester', 'Wiring diagram'],
			cautions: [
				'Assist can return suddenly during testing: keep hands clear of the steering wheel spokes.',
				'Obey traffic law during the road test.'
			],
			serviceInfo: ['diagnostic procedure', 'wiring diagram', 'service bulletin'],
			questions: [
				{
					prompt: 'Why are battery and charging checked first?',
					options: [
						{ text: 'The scan tool needs it', correct: false },
						{ text: 'It is only a maintenance step', correct: false },
						{
							text: 'The assist motor draws high current, and low voltage reduces assist and sets codes',
							correct: true
						}
					],
					explanation:
						'Electric assist is one of the largest loads on the vehicle and is cut back when voltage is low.'
				},
				{
					prompt:
						'Assist weakens after repeated lock-to-lock parking and returns after a rest. What is likely?',
					options: [
						{ text: 'Low power steering fluid', correct: false },
						{ text: 'Normal thermal protection of the assist motor', correct: true },
						{ text: 'A failed torque sensor', correct: false }
					],
					explanation:
						'The system limits current when the motor gets hot and restores it as it cools.'
				}
			]
		},
		{
			code: 'SUS-09',
			title: 'Replace a tyre pressure monitoring sensor and relearn it',
			description:
				'Replace a faulty wheel-mounted pressure sensor without damaging it during tyre removal, then program or relearn its position.',
			tier: 2,
			requiredLevel: 3,
			minHours: 2,
			checklist: [
				{ text: 'Read all sensors with a TPMS tool and record their IDs before dismounting' },
				{ text: 'Raise and support the vehicle', safety: true },
				{ text: 'Deflate fully by removing the valve core before breaking the bead', safety: true },
				{ text: 'Break the bead away from the valve stem area' },
				{ text: 'Fit the new sensor with new seal, nut and core and torque to specification' },
				{
					text: 'Mount and inflate the tyre in a safety cage or with a clip-on chuck',
					safety: true
				},
				{ text: 'Balance the wheel and torque the wheel nuts', safety: true },
				{ text: 'Relearn or program the sensor and confirm the warning lamp goes out' }
			],
			specs: [
				{ label: 'Sensor retaining nut torque', value: 4, unit: 'N·m', limit: 'nominal' },
				{ label: 'Valve core torque', value: 4, unit: 'lbf·in', limit: 'nominal' },
				{ label: 'Cold tyre pressure', value: 240, unit: 'kPa', limit: 'nominal' }
			],
			tools: [
				'TPMS scan tool',
				'Tyre changer',
				'Valve core tool',
				'Inch-pound torque wrench',
				'Inflation cage'
			],
			cautions: [
				'A tyre can burst while seating the bead: use a cage or clip-on chuck and stand clear.',
				'Remove the valve core to fully deflate before working on the bead.'
			],
			serviceInfo: ['repair procedure', 'specifications', 'owner information'],
			questions: [
				{
					prompt: 'Why break the bead away from the valve stem area?',
					options: [
						{ text: 'The bead breaker can crush the sensor inside the rim', correct: true },
						{ text: 'The bead is thinner there', correct: false },
						{ text: 'It stops the valve leaking', correct: false }
					],
					explanation: 'The sensor body sits just inside the rim behind the valve stem.'
				},
				{
					prompt: 'Why must a new sensor be relearned?',
					options: [
						{ text: 'The module must learn the new ID and its wheel position', correct: true },
						{ text: 'To calibrate its battery', correct: false },
						{ text: 'Sensors read zero until relearned', correct: false }
					],
					explanation:
						'Without its ID the module cannot use the sensor and the warning lamp stays on.'
				},
				{
					prompt: 'Why is a new seal, nut and valve core fitted with a sensor?',
					options: [
						{ text: 'They set the sensor ID', correct: false },
						{ text: 'They make the sensor read higher', correct: false },
						{
							text: 'Old seals take a set and old parts may be corroded, causing slow leaks',
							correct: true
						}
					],
					explanation:
						'Fresh sealing parts prevent the slow leaks that trigger the warning lamp again.'
				}
			]
		},
		{
			code: 'SUS-10',
			title: 'Calibrate the steering angle sensor',
			description:
				'Calibrate the steering angle sensor with a scan tool after alignment or steering work, so stability control knows where straight ahead is.',
			tier: 2,
			requiredLevel: 3,
			minHours: 1,
			checklist: [
				{ text: 'Confirm the alignment is correct and the steering wheel is centred' },
				{ text: 'Park on level ground with the wheels straight ahead' },
				{ text: 'Connect a battery support unit', safety: true },
				{ text: 'Run the calibration with the scan tool as directed' },
				{ text: 'Check the angle reads near zero straight ahead and follows steering input' },
				{
					text: 'Clear codes and road test to confirm the stability control lamp stays off',
					safety: true
				}
			],
			specs: [
				{ label: 'Battery voltage during calibration', value: 12.5, unit: 'V', limit: 'minimum' }
			],
			tools: ['Scan tool', 'Battery support unit', 'Steering wheel level'],
			cautions: ['Obey traffic law during the road test.'],
			serviceInfo: ['repair procedure', 'service bulletin'],
			questions: [
				{
					prompt:
						'Why calibrate the steering angle sensor after an alignment that moved the wheel centre?',
					options: [
						{ text: 'It is only needed after airbag work', correct: false },
						{
							text: 'Stability control compares steering angle with vehicle rotation and may brake wrongly if zero is off',
							correct: true
						},
						{ text: 'To set the toe', correct: false }
					],
					explanation:
						'A wrong zero makes the system think the driver is turning and can trigger warnings or interventions.'
				},
				{
					prompt: 'Why must alignment be finished before calibrating the sensor?',
					options: [
						{ text: 'The order does not matter', correct: false },
						{
							text: 'Changing toe afterwards moves the straight-ahead position again',
							correct: true
						},
						{ text: 'The alignment machine performs the calibration', correct: false }
					],
					explanation:
						'The calibration records straight ahead, so it must follow the last toe change.'
				}
			]
		},
		{
			code: 'SUS-11',
			title: 'Replace stabiliser bar links and bushings',
			description:
				'Replace worn stabiliser links and bar bushings with the suspension at equal height and tighten them to specification.',
			tier: 2,
			requiredLevel: 4,
			minHours: 1.5,
			checklist: [
				{ text: 'Raise and support the vehicle', safety: true },
				{ text: 'Support both sides at equal height so the bar is not twisted' },
				{ text: 'Hold the ball stud with a hex key while turning the nut' },
				{ text: 'Fit new links and bushings with the specified lubricant where required' },
				{ text: 'Torque link nuts and bracket bolts to specification', safety: true },
				{ text: 'Road test for clunks over bumps', safety: true }
			],
			specs: [
				{ label: 'Link nut torque', value: 50, unit: 'N·m', limit: 'nominal' },
				{ label: 'Bushing bracket bolt torque', value: 45, unit: 'N·m', limit: 'nominal' }
			],
			tools: ['Hex key and wrench set', 'Jack', 'Torque wrench'],
			cautions: ['A twisted stabiliser bar can spring when the link is freed: unload it first.'],
			serviceInfo: ['repair procedure', 'specifications'],
			questions: [
				{
					prompt: 'Why support both sides at the same height before fitting links?',
					options: [
						{
							text: 'An unequal height twists the bar, so holes do not line up and the bar is preloaded',
							correct: true
						},
						{ text: 'To reach the nuts', correct: false },
						{ text: 'It does not matter', correct: false }
					],
					explanation: 'A preloaded bar makes the vehicle lean and strains the new links.'
				},
				{
					prompt: 'A light clunk over small bumps at low speed is most often caused by what?',
					options: [
						{ text: 'A worn wheel bearing', correct: false },
						{ text: 'Low tyre pressure', correct: false },
						{ text: 'Worn stabiliser links or bushings', correct: true }
					],
					explanation: 'Loose link joints knock as the bar moves over small bumps.'
				}
			]
		},
		{
			code: 'SUS-12',
			title: 'Replace a front lower control arm',
			description:
				'Replace a lower control arm with worn bushings or ball joint, tighten the bushing bolts at ride height and check the alignment.',
			tier: 2,
			requiredLevel: 3,
			minHours: 3,
			checklist: [
				{ text: 'Raise and support the vehicle', safety: true },
				{ text: 'Support the spring load where the spring sits on the arm', safety: true },
				{ text: 'Separate the ball joint and remove the pivot bolts' },
				{ text: 'Fit the new arm with pivot bolts snug only' },
				{ text: 'Raise the arm to ride height and torque the pivot bolts', safety: true },
				{ text: 'Torque the ball joint fasteners and fit locks', safety: true },
				{ text: 'Check and set the alignment and road test', safety: true }
			],
			specs: [
				{ label: 'Pivot bolt torque', value: 100, unit: 'N·m', limit: 'nominal' },
				{ label: 'Ball joint pinch bolt torque', value: 60, unit: 'N·m', limit: 'nominal' },
				{ label: 'Wheel nut torque', value: 110, unit: 'N·m', limit: 'nominal' }
			],
			tools: ['Ball joint separator', 'Floor jack', 'Alignment system', 'Torque wrench'],
			cautions: [
				'Springs are under load: support the arm before freeing it.',
				'Support the vehicle on stands or a hoist before removing a wheel.'
			],
			serviceInfo: ['repair procedure', 'specifications'],
			questions: [
				{
					prompt: 'Why are pivot bolts torqued at ride height?',
					options: [
						{ text: 'The bolts can only be reached then', correct: false },
						{ text: 'It sets camber', correct: false },
						{
							text: 'Bushings clamped with the arm hanging are twisted at ride height and fail early',
							correct: true
						}
					],
					explanation: 'Rubber bushings should sit at rest in the normal position.'
				},
				{
					prompt: 'Why check alignment after replacing a control arm?',
					options: [
						{ text: 'Only to satisfy the customer', correct: false },
						{ text: 'A new arm can change camber and toe slightly', correct: true },
						{ text: 'The arm has to be adjusted to fit', correct: false }
					],
					explanation: 'Small dimensional differences in the new arm move the wheel position.'
				}
			]
		}
	]
};
