export const DEMO_PASSWORD = 'surf-demo-2026';
export const DEMO_CLUBS = [
    {
        slug: 'gannet-bay', name: 'Gannet Bay Surf Life Saving Club', timeZone: 'Australia/Sydney',
        latitude: -33.2871, longitude: 151.5692, pressureUnit: 'kPa', windUnit: 'kn',
        members: [
            { email: 'admin@gannetbay.example', displayName: 'Mara Okonkwo-Hale', role: 'admin' },
            { email: 'captain@gannetbay.example', displayName: 'Tomas Varga', role: 'supervisor' },
            { email: 'driver@gannetbay.example', displayName: 'Priya Lindholm', role: 'driver' },
            { email: 'crew@gannetbay.example', displayName: 'Sam Whitcombe', role: 'crew' },
        ],
    },
    {
        slug: 'kelp-reef', name: 'Kelp Reef Surf Lifesaving Club', timeZone: 'Pacific/Auckland',
        latitude: -36.9021, longitude: 174.4263, pressureUnit: 'psi', windUnit: 'km/h', awardCheck: 'block',
        members: [
            { email: 'admin@kelpreef.example', displayName: 'Aroha Pennington', role: 'admin' },
            { email: 'crew@kelpreef.example', displayName: 'Declan Moss', role: 'crew' },
        ],
    },
];
//# sourceMappingURL=demo-scenario.js.map