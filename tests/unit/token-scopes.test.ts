import { describe, expect, test } from 'vitest';
import { tokenMayRequest } from '../../shared/auth/token-scopes.ts';
import { pathMatches } from '../../shared/auth/path-pattern.ts';

describe('pathMatches', () => {
  test.each([
    ['/api/actuators/:actuatorId/runs', '/api/actuators/12/runs', true],
    ['/api/actuators/:actuatorId/runs', '/api/actuators/12/runs/', true],
    ['/api/actuators/:actuatorId/runs', '/API/Actuators/12/RUNS', true],
    ['/api/actuators/:actuatorId/runs', '/api/actuators//runs', false],
    ['/api/actuators/:actuatorId/runs', '/api/actuators/12/runs/3', false],
    ['/api/actuators/:actuatorId/runs', '/api/actuators/12', false],
    ['/api/*', '/api/parts', true],
    ['/api/*', '/api/builds/3/photos', true],
    ['/api/*', '/api', false],
    ['/api/*', '/apix/parts', false],
  ])('when %s meets %s, then %s [practice: Express route matching]', (pattern, path, expected) => {
    expect(pathMatches(pattern, path)).toBe(expected);
  });
});

describe('tokenMayRequest', () => {
  test.each([
    [['runs:write'], 'POST', '/api/actuators/5/runs', true],
    [['runs:write'], 'PATCH', '/api/runs/9', true],
    [['runs:write'], 'DELETE', '/api/runs/9', false],
    [['runs:write'], 'GET', '/api/runs/9', false],
    [['runs:write'], 'POST', '/api/builds', false],
    [['read'], 'GET', '/api/builds/3', true],
    [['read'], 'HEAD', '/api/parts', true],
    [['read'], 'POST', '/api/actuators/5/runs', false],
    [['read'], 'GET', '/', false],
    [['read', 'runs:write'], 'GET', '/api/account/tokens', false],
    [['read', 'runs:write'], 'POST', '/api/account/tokens', false],
    [['read', 'runs:write'], 'DELETE', '/api/account/tokens/4', false],
    [['read'], 'GET', '/api/session', false],
    [['read'], 'GET', '/api/Account/Tokens/', false],
  ] as const)('when scopes %j send %s %s, then %s [practice]', (scopes, method, path, expected) => {
    expect(tokenMayRequest(scopes, method, path)).toBe(expected);
  });
});
